import { QueryClientProvider } from '@tanstack/react-query';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { createQueryClient } from '../../../lib/query-client';
import type { Attachment } from '../api/types';
import { renderWithTheme } from '../test-render';
import { AttachmentsList } from './attachments-list';

const sketch = [
  '// Moves the carriage one finger at a time.',
  'const long STEPS_PER_MM = 400;',
  'void loop() {',
  '  digitalWrite(STEP_PIN, HIGH);',
  '}',
].join('\n');

const attachments: Attachment[] = [
  {
    id: 3,
    name: 'indexer.ino',
    mediaType: 'text/x-c++src',
    size: sketch.length,
    description: 'Controller sketch',
    downloadUrl: '/api/plans/indexer/revisions/1/attachments/3',
  },
  {
    id: 4,
    name: 'wiring.pdf',
    mediaType: 'application/pdf',
    size: 48_000,
    description: '',
    downloadUrl: '/api/plans/indexer/revisions/1/attachments/4',
  },
];

function renderList() {
  return renderWithTheme(
    <QueryClientProvider client={createQueryClient()}>
      <AttachmentsList attachments={attachments} />
    </QueryClientProvider>,
  );
}

describe('AttachmentsList', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('opens controller code in place with its keywords, comments and numbers marked, fetching it only when asked', async () => {
    const fetched = vi.fn(async () => new Response(sketch, { headers: { 'Content-Type': 'text/x-c++src' } }));
    vi.stubGlobal('fetch', fetched);
    renderList();
    expect(fetched).not.toHaveBeenCalled();
    await userEvent.click(screen.getByRole('button', { name: 'Show the code' }));
    const code = await screen.findByLabelText('Contents of indexer.ino', {}, { timeout: 10_000 });
    expect(code.textContent).toBe(sketch);
    expect(String(fetched.mock.calls[0]?.[0 as never])).toBe('/api/plans/indexer/revisions/1/attachments/3');
    const marked = (kind: string) => [...code.querySelectorAll(`.hljs-${kind}`)].map((node) => node.textContent);
    expect(marked('comment')).toEqual(['// Moves the carriage one finger at a time.']);
    expect(marked('type')).toEqual(['const', 'long', 'void']);
    expect(marked('built_in')).toEqual(['digitalWrite']);
    expect(marked('number')).toEqual(['400']);
    expect(code.querySelector('script')).toBeNull();
  });

  it('offers every file as a download and a PDF only as a download', () => {
    vi.stubGlobal('fetch', vi.fn());
    renderList();
    expect(screen.getByRole('link', { name: 'Download wiring.pdf' }).getAttribute('href')).toBe(
      '/api/plans/indexer/revisions/1/attachments/4',
    );
    expect(screen.getAllByRole('button', { name: 'Show the code' })).toHaveLength(1);
  });

  it('says so when the file cannot be fetched', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () =>
        Response.json(
          { statusCode: 503, code: 'storage_unavailable', message: 'The file store is not answering.' },
          { status: 503 },
        ),
      ),
    );
    renderList();
    await userEvent.click(screen.getByRole('button', { name: 'Show the code' }));
    expect((await screen.findByRole('alert')).textContent).toContain('The file store is not answering.');
  });
});
