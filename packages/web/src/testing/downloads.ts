import { vi } from 'vitest';

/**
 * Catches the files a page offers for download (an object URL clicked through an anchor), since
 * jsdom cannot save them: `files` collects each one, `clicks` counts the downloads started.
 */
export function catchDownloads() {
  const files: Blob[] = [];
  vi.spyOn(URL, 'createObjectURL').mockImplementation((blob) => {
    files.push(blob as Blob);
    return `blob:download-${files.length}`;
  });
  vi.spyOn(URL, 'revokeObjectURL').mockImplementation(() => undefined);
  const clicks = vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(() => undefined);
  return { files, clicks };
}

export function readBlob(blob: Blob): Promise<string> {
  return new Promise((resolve, reject) => {
    const reader = new FileReader();
    reader.onload = () => resolve(String(reader.result));
    reader.onerror = () => reject(reader.error);
    reader.readAsText(blob);
  });
}
