import { act, renderHook, waitFor } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { ApiError } from '../../lib/api-client';
import type { UploadOptions } from '../../lib/upload';
import type { UploadTarget } from './upload-queue';
import { useUploadQueue } from './use-upload-queue';

const DRAWING: UploadTarget = { what: 'drawing', maxBytes: 1000 };

/** A send whose progress, last byte and answer the test gives, one file at a time. */
function controlledSend() {
  const calls: Array<{ file: File; options: UploadOptions; answer(id: number): void; fail(error: unknown): void }> = [];
  const send = vi.fn(
    (file: File, options: UploadOptions) =>
      new Promise<{ id: number }>((resolve, reject) => {
        options.signal?.addEventListener('abort', () => reject(new DOMException('Cancelled', 'AbortError')));
        calls.push({ file, options, answer: (id) => resolve({ id }), fail: reject });
      }),
  );
  return { send, calls };
}

const file = (name: string, size = 100) => new File(['x'.repeat(size)], name);

function setUp() {
  const { send, calls } = controlledSend();
  const remove = vi.fn(async () => undefined);
  const onSettled = vi.fn();
  const refuse = (candidate: File) => (candidate.size > DRAWING.maxBytes ? `${candidate.name} is too large` : null);
  const hook = renderHook(() => useUploadQueue(DRAWING, { send, remove, onSettled, refuse }));
  return { hook, calls, send, remove, onSettled };
}

describe('the upload queue hook', () => {
  it('shows progress, then drops the file and reads the revision again when it arrived', async () => {
    const { hook, calls, onSettled } = setUp();
    act(() => hook.result.current.add([file('sled.dxf')]));
    expect(hook.result.current.items).toMatchObject([{ name: 'sled.dxf', phase: 'sending' }]);
    act(() => calls[0]!.options.onProgress?.({ loaded: 60, total: 120 }));
    expect(hook.result.current.items[0]).toMatchObject({ loaded: 60, total: 120 });
    act(() => calls[0]!.options.onSent?.());
    expect(hook.result.current.items[0]!.phase).toBe('checking');
    await act(async () => calls[0]!.answer(7));
    expect(hook.result.current.items).toEqual([]);
    expect(onSettled).toHaveBeenCalledOnce();
  });

  it('aborts a file still sending, and sends nothing for a file refused before sending', async () => {
    const { hook, calls, send, remove } = setUp();
    act(() => hook.result.current.add([file('a.dxf'), file('big.dxf', 2000)]));
    expect(send).toHaveBeenCalledOnce();
    expect(hook.result.current.items[1]).toMatchObject({ phase: 'failed', message: 'big.dxf is too large' });
    const key = hook.result.current.items[0]!.key;
    act(() => hook.result.current.cancel(key));
    await waitFor(() => expect(hook.result.current.items.map((item) => item.name)).toEqual(['big.dxf']));
    expect(calls[0]!.options.signal?.aborted).toBe(true);
    expect(remove).not.toHaveBeenCalled();
  });

  it('deletes what the server stored for a file cancelled after its last byte had left', async () => {
    const { hook, calls, remove } = setUp();
    act(() => hook.result.current.add([file('late.dxf')]));
    act(() => calls[0]!.options.onSent?.());
    act(() => hook.result.current.cancel(hook.result.current.items[0]!.key));
    expect(hook.result.current.items[0]!.cancelling).toBe(true);
    expect(calls[0]!.options.signal?.aborted).toBe(false);
    await act(async () => calls[0]!.answer(42));
    expect(remove).toHaveBeenCalledWith(42);
    expect(hook.result.current.items).toEqual([]);
  });

  it('keeps a refused file with the reason', async () => {
    const { hook, calls } = setUp();
    act(() => hook.result.current.add([file('sled.dxf')]));
    await act(async () => calls[0]!.fail(new ApiError(409, 'Already there.', 'duplicate_drawing')));
    expect(hook.result.current.items[0]).toMatchObject({
      phase: 'failed',
      message: '“sled.dxf” is already on this revision: the same file was uploaded before.',
    });
    act(() => hook.result.current.dismiss(hook.result.current.items[0]!.key));
    expect(hook.result.current.items).toEqual([]);
  });
});
