import DxfParser, { type IDxf } from 'dxf-parser';
import { DrawingError, DrawingLimitError } from './drawing-error';
import { splineHandler, unknownEntityHandler } from './entity-handlers';
import type { DrawingLimits } from './limits';

const BINARY_SENTINEL = 'AutoCAD Binary DXF';

/**
 * Parses DXF text with dxf-parser after cheap checks that turn the common failures (empty,
 * binary, not DXF, cut short) into clear errors, since the parser itself either throws vague
 * messages or quietly returns nothing for them.
 */
export function readDxf(text: string, limits: DrawingLimits): IDxf {
  if (text.length > limits.maxFileSize) {
    throw new DrawingLimitError('maxFileSize', limits.maxFileSize, `the file has ${text.length} characters`);
  }
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  if (body.trim() === '') throw new DrawingError('empty', 'the file is empty');
  if (body.startsWith(BINARY_SENTINEL)) {
    throw new DrawingError('binary', 'binary DXF is not supported: save the drawing as ASCII DXF');
  }
  checkStart(body);
  checkEnd(body);
  const dxf = parse(body);
  const entityCount =
    (dxf.entities?.length ?? 0) +
    Object.values(dxf.blocks ?? {}).reduce((sum, block) => sum + (block.entities?.length ?? 0), 0);
  if (entityCount > limits.maxEntities) {
    throw new DrawingLimitError('maxEntities', limits.maxEntities, `the file holds ${entityCount} entities`);
  }
  return dxf;
}

function checkStart(body: string): void {
  const lines = body.slice(0, 400).split(/\r\n|\r|\n/);
  const firstIndex = lines.findIndex((line) => line.trim() !== '');
  const first = lines[firstIndex]?.trim() ?? '';
  const value = lines[firstIndex + 1]?.trim();
  const looksLikeStart = (first === '0' && (value === 'SECTION' || value === 'EOF')) || first === '999';
  if (!looksLikeStart) {
    throw new DrawingError('not-dxf', 'not a DXF file: it does not start with a SECTION group', firstIndex + 1);
  }
}

function checkEnd(body: string): void {
  const tail = body
    .slice(-200)
    .trimEnd()
    .split(/\r\n|\r|\n/);
  const last = tail[tail.length - 1]?.trim();
  const code = tail[tail.length - 2]?.trim();
  if (last !== 'EOF' || code !== '0') {
    const lineCount = body.trimEnd().split(/\r\n|\r|\n/).length;
    throw new DrawingError('truncated', 'the file is cut short: it ends without the EOF group', lineCount);
  }
}

function parse(body: string): IDxf {
  const parser = new DxfParser();
  parser.registerEntityHandler(
    class {
      ForEntityName = splineHandler.ForEntityName;
      parseEntity = splineHandler.parseEntity;
    } as unknown as Parameters<DxfParser['registerEntityHandler']>[0],
  );
  // dxf-parser skips entity types it has no handler for without a trace; a fallback handler for
  // any other name lets the analysis count and report them (the field is private in 1.1.2, pinned).
  const internals = parser as unknown as { _entityHandlers: Record<string, unknown> };
  const known = internals._entityHandlers;
  internals._entityHandlers = new Proxy(known, {
    get: (target, name) =>
      typeof name === 'string' && !(name in target) && /^[A-Z0-9_]+$/.test(name)
        ? unknownEntityHandler(name)
        : target[name as string],
  });
  let dxf: IDxf | null;
  try {
    dxf = parser.parseSync(body);
  } catch (error) {
    const reason = error instanceof Error ? error.message : String(error);
    throw new DrawingError('unreadable', `the DXF could not be read: ${reason}`, firstBadGroupLine(body));
  }
  if (!dxf) throw new DrawingError('unreadable', 'the DXF could not be read');
  return dxf;
}

/** Line of the first group code that is not an integer, to point the author at the damage. */
function firstBadGroupLine(body: string): number | undefined {
  const lines = body.split(/\r\n|\r|\n/);
  for (let i = 0; i + 1 < lines.length; i += 2) {
    if (!/^\s*-?\d+\s*$/.test(lines[i] ?? '')) return i + 1;
  }
  return undefined;
}
