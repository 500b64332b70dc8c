/** How the plan page shows an attachment: as code with a highlighting language, as an image, or only as a download. */
export type AttachmentView = { kind: 'code'; language: CodeLanguage } | { kind: 'image' } | { kind: 'download' };

/** The highlight.js grammars the code view loads; anything else text is shown plain. */
export const CODE_LANGUAGES = [
  'arduino',
  'cpp',
  'c',
  'python',
  'javascript',
  'typescript',
  'json',
  'yaml',
  'markdown',
  'gcode',
  'plaintext',
] as const;
export type CodeLanguage = (typeof CODE_LANGUAGES)[number];

const BY_EXTENSION: Record<string, CodeLanguage> = {
  ino: 'arduino',
  cpp: 'cpp',
  cc: 'cpp',
  hpp: 'cpp',
  c: 'c',
  h: 'c',
  py: 'python',
  js: 'javascript',
  ts: 'typescript',
  json: 'json',
  yaml: 'yaml',
  yml: 'yaml',
  md: 'markdown',
  gcode: 'gcode',
  nc: 'gcode',
  ngc: 'gcode',
};

const BY_MEDIA_TYPE: Record<string, CodeLanguage> = {
  'text/x-c++src': 'cpp',
  'text/x-c++hdr': 'cpp',
  'text/x-csrc': 'c',
  'text/x-chdr': 'c',
  'text/x-python': 'python',
  'text/javascript': 'javascript',
  'text/x-typescript': 'typescript',
  'application/json': 'json',
  'text/yaml': 'yaml',
  'text/markdown': 'markdown',
  'text/x-gcode': 'gcode',
};

/** Text longer than this is offered only as a download: highlighting it would stall the page. */
export const LARGEST_SHOWN_TEXT_BYTES = 256 * 1024;

/**
 * Picks the view from the stored media type (the server checked the content) and the file name
 * (an Arduino sketch is stored as C++ source, but reads better with the Arduino grammar).
 */
export function attachmentViewOf(attachment: { name: string; mediaType: string; size: number }): AttachmentView {
  const { mediaType } = attachment;
  if (mediaType.startsWith('image/')) return { kind: 'image' };
  const isText = mediaType.startsWith('text/') || mediaType === 'application/json';
  if (!isText || attachment.size > LARGEST_SHOWN_TEXT_BYTES) return { kind: 'download' };
  const extension = /\.([^./]+)$/.exec(attachment.name)?.[1]?.toLowerCase() ?? '';
  return { kind: 'code', language: BY_EXTENSION[extension] ?? BY_MEDIA_TYPE[mediaType] ?? 'plaintext' };
}
