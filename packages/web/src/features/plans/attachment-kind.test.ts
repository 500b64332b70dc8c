import { describe, expect, it } from 'vitest';
import { attachmentViewOf, LARGEST_SHOWN_TEXT_BYTES } from './attachment-kind';

const file = (name: string, mediaType: string, size = 1200) => ({ name, mediaType, size });

describe('attachmentViewOf', () => {
  it('highlights controller code by its file name first', () => {
    expect(attachmentViewOf(file('indexer.ino', 'text/x-c++src'))).toEqual({ kind: 'code', language: 'arduino' });
    expect(attachmentViewOf(file('steps.h', 'text/x-chdr'))).toEqual({ kind: 'code', language: 'c' });
    expect(attachmentViewOf(file('board-a.nc', 'text/x-gcode'))).toEqual({ kind: 'code', language: 'gcode' });
  });

  it('falls back to the media type, then to plain text', () => {
    expect(attachmentViewOf(file('README', 'text/markdown'))).toEqual({ kind: 'code', language: 'markdown' });
    expect(attachmentViewOf(file('cuts.csv', 'text/csv'))).toEqual({ kind: 'code', language: 'plaintext' });
  });

  it('shows images as pictures and offers PDFs and very long text only as downloads', () => {
    expect(attachmentViewOf(file('jig.png', 'image/png'))).toEqual({ kind: 'image' });
    expect(attachmentViewOf(file('manual.pdf', 'application/pdf'))).toEqual({ kind: 'download' });
    expect(attachmentViewOf(file('huge.ino', 'text/x-c++src', LARGEST_SHOWN_TEXT_BYTES + 1))).toEqual({
      kind: 'download',
    });
  });
});
