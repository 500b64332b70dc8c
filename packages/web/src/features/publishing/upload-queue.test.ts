import { describe, expect, it } from 'vitest';
import { ApiError } from '../../lib/api-client';
import {
  formatBytes,
  newUploadItem,
  notDrawingMessage,
  percentSent,
  tooLargeMessage,
  uploadFailureMessage,
  uploadQueueReducer,
} from './upload-queue';

const drawing = { what: 'drawing' as const, maxBytes: 16 * 1024 * 1024 };

describe('the upload queue', () => {
  it('follows a file from sending through checking, and drops it when it arrived', () => {
    let items = uploadQueueReducer([], { type: 'add', items: [newUploadItem('a', { name: 'sled.dxf', size: 1000 })] });
    expect(items[0]).toMatchObject({ phase: 'sending', loaded: 0, total: 1000 });
    // The request body is larger than the file (the form around it): the bar follows the body.
    items = uploadQueueReducer(items, { type: 'progress', key: 'a', loaded: 600, total: 1200 });
    expect(percentSent(items[0]!)).toBe(50);
    items = uploadQueueReducer(items, { type: 'sent', key: 'a' });
    expect(items[0]).toMatchObject({ phase: 'checking', loaded: 1200 });
    expect(percentSent(items[0]!)).toBe(100);
    expect(uploadQueueReducer(items, { type: 'remove', key: 'a' })).toEqual([]);
  });

  it('keeps a failed file with its reason, and leaves the other files alone', () => {
    const start = [newUploadItem('a', { name: 'a.dxf', size: 10 }), newUploadItem('b', { name: 'b.dxf', size: 10 })];
    const cancelling = uploadQueueReducer(start, { type: 'cancelling', key: 'a' });
    expect(cancelling[0]!.cancelling).toBe(true);
    const failed = uploadQueueReducer(cancelling, { type: 'failed', key: 'a', message: 'Refused' });
    expect(failed[0]).toMatchObject({ phase: 'failed', message: 'Refused', cancelling: false });
    expect(failed[1]).toBe(start[1]);
    expect(start[0]!.phase).toBe('sending');
  });

  it('starts a file refused before sending as failed', () => {
    expect(newUploadItem('c', { name: 'x.pdf', size: 5 }, 'Not a drawing').phase).toBe('failed');
  });
});

describe('the checks before sending', () => {
  it('refuses a drawing over the 16 MB limit and lets one at the limit go', () => {
    expect(tooLargeMessage({ name: 'big.dxf', size: 16 * 1024 * 1024 }, drawing)).toBeNull();
    expect(tooLargeMessage({ name: 'big.dxf', size: 20 * 1024 * 1024 + 300 * 1024 }, drawing)).toBe(
      '“big.dxf” is 20.3 MB; a drawing may be at most 16 MB.',
    );
  });

  it('knows drawings by their .dxf name, in either case', () => {
    expect(notDrawingMessage({ name: 'Sled.DXF' })).toBeNull();
    expect(notDrawingMessage({ name: 'sled.dwg' })).toMatch(/not a DXF drawing/);
  });

  it('writes sizes in binary multiples as the limits are', () => {
    expect(formatBytes(512)).toBe('512 bytes');
    expect(formatBytes(39_117)).toBe('38.2 KB');
    expect(formatBytes(8 * 1024 * 1024)).toBe('8 MB');
  });
});

describe('the messages for refused uploads', () => {
  it('says plainly that a file was uploaded already', () => {
    const error = new ApiError(409, 'This drawing is already on the revision.', 'duplicate_drawing');
    expect(uploadFailureMessage(error, 'sled.dxf', drawing)).toBe(
      '“sled.dxf” is already on this revision: the same file was uploaded before.',
    );
  });

  it("passes on the server's reason for a file of the wrong kind or too large", () => {
    const notDxf = new ApiError(400, 'This file is not a DXF drawing: it is not text.', 'not_dxf');
    expect(uploadFailureMessage(notDxf, 'photo.dxf', drawing)).toBe(
      '“photo.dxf” was not kept: This file is not a DXF drawing: it is not text.',
    );
    const large = new ApiError(413, 'This drawing is larger than the 16 MB a drawing may be.', 'file_too_large');
    expect(uploadFailureMessage(large, 'big.dxf', drawing)).toBe(
      '“big.dxf”: This drawing is larger than the 16 MB a drawing may be.',
    );
  });

  it('tells a dropped connection from a refusal', () => {
    expect(uploadFailureMessage(new TypeError('The upload could not reach the server.'), 'a.dxf', drawing)).toBe(
      '“a.dxf” was not uploaded: The upload could not reach the server.',
    );
  });
});
