import DxfParser, { type IBlock, type IDxf, type IEntity } from 'dxf-parser';
import { DrawingError, DrawingLimitError } from './drawing-error';
import { splineHandler, unknownEntityHandler } from './entity-handlers';
import type { DrawingLimits } from './limits';
import { splitDxf } from './split-dxf';

const BINARY_SENTINEL = 'AutoCAD Binary DXF';
// About a thousand entities of a few dozen groups each: the parse objects of one chunk stay in
// the young generation, so the collector never walks a whole drawing's worth of them.
const GROUPS_PER_CHUNK = 32_768;

/** Blocks or model-space entities from one piece of the text, as dxf-parser gives them. */
export interface DxfPart {
  blocks?: Record<string, IBlock>;
  entities?: IEntity[];
}

export interface ChunkedDxf {
  header: IDxf['header'];
  /** Parsed one after the other as they are iterated, in file order. */
  parts: Iterable<DxfPart>;
}

/**
 * Parses DXF text with dxf-parser after cheap checks that turn the common failures (empty,
 * binary, not DXF, cut short) into clear errors, since the parser itself either throws vague
 * messages or quietly returns nothing for them.
 */
export function readDxf(text: string, limits: DrawingLimits): IDxf {
  const dxf = parse(checkedBody(text, limits));
  checkEntityCount(countEntities(dxf), limits);
  return dxf;
}

/**
 * `readDxf` a piece at a time: the BLOCKS and ENTITIES sections are cut at block and entity
 * boundaries and each piece is parsed alone (with the header, tables and the rest parsed once),
 * so that the caller can turn each piece into its own compact form and drop the parser's objects.
 * Entity handles the parser numbers itself continue from piece to piece; an error anywhere is
 * the error of the whole parse.
 */
export function readDxfInChunks(
  text: string,
  limits: DrawingLimits,
  options: { groupsPerChunk?: number } = {},
): ChunkedDxf {
  const body = checkedBody(text, limits);
  const layout = splitDxf(body, options.groupsPerChunk ?? GROUPS_PER_CHUNK);
  if (!layout) {
    const dxf = readDxf(text, limits);
    return { header: dxf.header ?? {}, parts: [dxf] };
  }
  const parser = newParser(layout.types);
  const header = parseAsPartOf(parser, layout.frame, body).header ?? {};
  function* parts(): Generator<DxfPart> {
    let entityCount = 0;
    let numbered = 0;
    for (const chunk of layout?.chunks ?? []) {
      const text = `0\nSECTION\n2\n${chunk.section}\n${body.slice(chunk.start, chunk.end)}0\nENDSEC\n0\nEOF\n`;
      const dxf = parseAsPartOf(parser, text, body);
      numbered = renumberHandles(dxf, numbered);
      entityCount += countEntities(dxf);
      checkEntityCount(entityCount, limits);
      yield chunk.section === 'BLOCKS' ? { blocks: dxf.blocks ?? {} } : { entities: dxf.entities ?? [] };
    }
  }
  return { header, parts: parts() };
}

function checkedBody(text: string, limits: DrawingLimits): string {
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
  return body;
}

function countEntities(dxf: Partial<IDxf>): number {
  let count = dxf.entities?.length ?? 0;
  for (const block of Object.values(dxf.blocks ?? {})) count += block.entities?.length ?? 0;
  return count;
}

function checkEntityCount(count: number, limits: DrawingLimits): void {
  if (count > limits.maxEntities) {
    throw new DrawingLimitError('maxEntities', limits.maxEntities, `the file holds ${count} entities`);
  }
}

/**
 * dxf-parser numbers the entities and blocks without a handle 0, 1, 2… in reading order; a piece
 * parsed alone starts again at 0, so its numbers move up by those the earlier pieces used.
 */
function renumberHandles(dxf: Partial<IDxf>, offset: number): number {
  let next = offset;
  const shift = (item: { handle?: unknown }): void => {
    if (typeof item.handle !== 'number') return;
    next = Math.max(next, offset + item.handle + 1);
    item.handle = offset + item.handle;
  };
  for (const block of Object.values(dxf.blocks ?? {})) {
    shift(block);
    for (const entity of block.entities ?? []) shift(entity);
  }
  for (const entity of dxf.entities ?? []) shift(entity);
  return next;
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

/**
 * A dxf-parser that reads SPLINE in full and stands an `unknownEntityHandler` in for every other
 * entity type it has no handler for, which it would otherwise skip without a trace, so that the
 * analysis can count and report them. `types` are the types the text names, when the splitter has
 * listed them: those get a handler each. Without the list, a proxy over the handlers (the field
 * is private in dxf-parser 1.1.2, pinned) answers for any name; it costs a trap per entity read.
 */
function newParser(types?: ReadonlySet<string>): DxfParser {
  const parser = new DxfParser();
  parser.registerEntityHandler(
    class {
      ForEntityName = splineHandler.ForEntityName;
      parseEntity = splineHandler.parseEntity;
    } as unknown as Parameters<DxfParser['registerEntityHandler']>[0],
  );
  const internals = parser as unknown as { _entityHandlers: Record<string, unknown> };
  const known = internals._entityHandlers;
  const unknown = (name: string | symbol): boolean =>
    typeof name === 'string' && !(name in known) && /^[A-Z0-9_]+$/.test(name);
  if (types) {
    for (const type of types) if (unknown(type)) known[type] = unknownEntityHandler(type);
    return parser;
  }
  internals._entityHandlers = new Proxy(known, {
    get: (target, name) => (unknown(name) ? unknownEntityHandler(name as string) : target[name as string]),
  });
  return parser;
}

function parse(body: string): IDxf {
  let dxf: IDxf | null;
  try {
    dxf = newParser().parseSync(body);
  } catch (error) {
    throw unreadable(error, body);
  }
  if (!dxf) throw new DrawingError('unreadable', 'the DXF could not be read');
  return dxf;
}

/** Parses a piece of `body`; when it fails, the whole text is parsed for the error it gives. */
function parseAsPartOf(parser: DxfParser, piece: string, body: string): Partial<IDxf> {
  try {
    return parseLines(parser, piece) ?? {};
  } catch (error) {
    parse(body);
    throw unreadable(error, body);
  }
}

/**
 * `parser.parseSync(text)`. dxf-parser 1.1.2 (pinned) begins by splitting the text into lines with
 * the regular expression /\r\n|\r|\n/, which takes about twice as long as a split at one
 * character: for a text without \r, the lines are the same, so its `_parse` is handed the text
 * in a wrapper whose `split` splits at \n.
 */
function parseLines(parser: DxfParser, text: string): IDxf | null {
  if (text.includes('\r')) return parser.parseSync(text);
  const internals = parser as unknown as { _parse(source: { split(separator: RegExp): string[] }): IDxf | null };
  return internals._parse({ split: () => text.split('\n') });
}

function unreadable(error: unknown, body: string): DrawingError {
  const reason = error instanceof Error ? error.message : String(error);
  return new DrawingError('unreadable', `the DXF could not be read: ${reason}`, firstBadGroupLine(body));
}

/** Line of the first group code that is not an integer, to point the author at the damage. */
function firstBadGroupLine(body: string): number | undefined {
  const lines = body.split(/\r\n|\r|\n/);
  for (let i = 0; i + 1 < lines.length; i += 2) {
    if (!/^\s*-?\d+\s*$/.test(lines[i] ?? '')) return i + 1;
  }
  return undefined;
}
