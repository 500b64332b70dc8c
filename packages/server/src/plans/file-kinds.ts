import { isUtf8 } from 'node:buffer';

/**
 * What an uploaded file is, judged by its bytes (the name's extension only picks the media type of
 * a text file). Browsers' and clients' declared media types are not trusted.
 */

const BINARY_DXF_SENTINEL = Buffer.from('AutoCAD Binary DXF\r\n\x1a\x00', 'latin1');

export type DrawingCheck = { ok: true } | { ok: false; code: 'binary_dxf' | 'not_dxf'; message: string };

/** An ASCII DXF starts, after blank space and 999 comments, with group code 0 and a SECTION. */
export function checkDrawingBytes(bytes: Buffer): DrawingCheck {
  if (bytes.subarray(0, BINARY_DXF_SENTINEL.length).equals(BINARY_DXF_SENTINEL)) {
    return {
      ok: false,
      code: 'binary_dxf',
      message: 'This is a binary DXF. Save the drawing as ASCII DXF (the text form) and upload that.',
    };
  }
  if (bytes.includes(0)) {
    return { ok: false, code: 'not_dxf', message: 'This file is not a DXF drawing: it is not text.' };
  }
  const lines = bytes
    .subarray(0, 4096)
    .toString('latin1')
    .replace(/^\uFEFF/, '')
    .split(/\r?\n/);
  let i = 0;
  while (i < lines.length && lines[i]!.trim() === '') i++;
  while (lines[i]?.trim() === '999') i += 2;
  if (lines[i]?.trim() === '0' && lines[i + 1]?.trim() === 'SECTION') return { ok: true };
  return {
    ok: false,
    code: 'not_dxf',
    message:
      'This file is not a DXF drawing: a DXF starts with a SECTION. Export the drawing from your CAD program as DXF.',
  };
}

interface Signature {
  mediaType: string;
  matches: (bytes: Buffer) => boolean;
}

const startsWith = (prefix: number[]) => (bytes: Buffer) =>
  bytes.length >= prefix.length && prefix.every((byte, i) => bytes[i] === byte);

const SIGNATURES: Signature[] = [
  { mediaType: 'application/pdf', matches: startsWith([0x25, 0x50, 0x44, 0x46, 0x2d]) },
  { mediaType: 'image/png', matches: startsWith([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]) },
  { mediaType: 'image/jpeg', matches: startsWith([0xff, 0xd8, 0xff]) },
  {
    mediaType: 'image/gif',
    matches: (bytes) => ['GIF87a', 'GIF89a'].includes(bytes.subarray(0, 6).toString('latin1')),
  },
  {
    mediaType: 'image/webp',
    matches: (bytes) =>
      bytes.subarray(0, 4).toString('latin1') === 'RIFF' && bytes.subarray(8, 12).toString('latin1') === 'WEBP',
  },
];

/** Media types of text attachments by extension; any other text file is text/plain. */
const TEXT_TYPES: Record<string, string> = {
  ino: 'text/x-c++src',
  cpp: 'text/x-c++src',
  cc: 'text/x-c++src',
  hpp: 'text/x-c++hdr',
  c: 'text/x-csrc',
  h: 'text/x-chdr',
  py: 'text/x-python',
  js: 'text/javascript',
  ts: 'text/x-typescript',
  json: 'application/json',
  md: 'text/markdown',
  csv: 'text/csv',
  gcode: 'text/x-gcode',
  nc: 'text/x-gcode',
  txt: 'text/plain',
  yaml: 'text/yaml',
  yml: 'text/yaml',
};

export type AttachmentKind = { ok: true; mediaType: string } | { ok: false; message: string };

/** PDFs and images by their magic numbers; otherwise UTF-8 text (controller code, notes, G-code). */
export function attachmentKindOf(bytes: Buffer, name: string): AttachmentKind {
  const signature = SIGNATURES.find((candidate) => candidate.matches(bytes));
  if (signature) return { ok: true, mediaType: signature.mediaType };
  if (bytes.includes(0) || !isUtf8(bytes)) {
    return {
      ok: false,
      message:
        'Attachments are PDFs, images (PNG, JPEG, GIF, WebP) or text files such as controller code; this file is none of those.',
    };
  }
  const extension = /\.([^.]+)$/.exec(name)?.[1]?.toLowerCase() ?? '';
  return { ok: true, mediaType: TEXT_TYPES[extension] ?? 'text/plain' };
}

/** Whether a stored media type is text, to send with a charset. */
export function isTextMediaType(mediaType: string): boolean {
  return mediaType.startsWith('text/') || mediaType === 'application/json';
}
