/** Where the BLOCKS and ENTITIES sections of a DXF text can be cut for parsing piece by piece. */
export interface DxfLayout {
  /** The text without the bodies of its BLOCKS and ENTITIES sections: header, tables and the rest. */
  frame: string;
  /** Runs of whole blocks or whole entities, in file order, as offsets into the text. */
  chunks: DxfChunk[];
  /** Every value of a group with code 0 inside those sections: all the entity types they name. */
  types: Set<string>;
}

export interface DxfChunk {
  section: 'BLOCKS' | 'ENTITIES';
  start: number;
  end: number;
}

type State = 'top' | 'to-endsec' | 'BLOCKS' | 'ENTITIES';

/**
 * Finds the group-code-0 boundaries of blocks and entities with a line scan that follows
 * dxf-parser's own reading (groups are line pairs from the first line; sections as its
 * `parseAll` dispatches them), so that each chunk, parsed alone, gives what the whole parse gives.
 * Undefined when the text strays from that plain structure (a section without ENDSEC, a block
 * without ENDBLK, a second ENTITIES section…): the caller then parses the text in one go.
 */
export function splitDxf(body: string, groupsPerChunk: number): DxfLayout | undefined {
  const chunks: DxfChunk[] = [];
  const cuts: [number, number][] = [];
  const seen = new Set<string>();
  const types = new Set<string>();
  let state: State = 'top';
  let inside = false;
  let bodyStart = 0;
  let chunkStart = 0;
  let groups = 0;
  let at = 0;
  // Most files end their lines with \n alone, found by the string's own search.
  const lineEnd = body.includes('\r') ? anyLineEnd : newlineEnd;
  while (at < body.length) {
    const codeEnd = lineEnd(body, at);
    const valueStart = nextLine(body, codeEnd);
    if (valueStart >= body.length && codeEnd >= body.length) return undefined;
    const valueEnd = lineEnd(body, valueStart);
    const next = nextLine(body, valueEnd);
    const zero = isCodeZero(body, at, codeEnd);
    const value = zero ? body.slice(valueStart, valueEnd).trim() : '';
    if (state === 'top') {
      if (zero && value === 'EOF') break;
      if (zero && value === 'SECTION') {
        const nameEnd = lineEnd(body, next);
        if (parseInt(body.slice(next, nameEnd)) !== 2) return undefined;
        const nameStart = nextLine(body, nameEnd);
        const nameLineEnd = lineEnd(body, nameStart);
        const name = body.slice(nameStart, nameLineEnd).trim();
        at = nextLine(body, nameLineEnd);
        if (name === 'BLOCKS' || name === 'ENTITIES') {
          if (seen.has(name)) return undefined;
          seen.add(name);
          state = name;
          bodyStart = at;
          chunkStart = at;
          groups = 0;
          inside = false;
        } else if (name === 'HEADER' || name === 'TABLES') {
          state = 'to-endsec';
          inside = false;
        }
        continue;
      }
    } else if (state === 'to-endsec') {
      if (zero && value === 'EOF') return undefined;
      if (zero && value === 'TABLE') inside = true;
      else if (zero && value === 'ENDTAB') inside = false;
      else if (zero && value === 'ENDSEC') {
        if (inside) return undefined;
        state = 'top';
      }
    } else {
      if (state === 'BLOCKS' && !zero && isEofValue(body, valueStart, valueEnd)) return undefined;
      if (zero) {
        types.add(value);
        if (value === 'EOF') return undefined;
        if (value === 'ENDSEC' && !inside) {
          if (at > chunkStart) chunks.push({ section: state, start: chunkStart, end: at });
          cuts.push([bodyStart, at]);
          state = 'top';
          at = next;
          continue;
        }
        const boundary = state === 'BLOCKS' ? value === 'BLOCK' && !inside : value !== 'VERTEX' && value !== 'SEQEND';
        if (state === 'BLOCKS') {
          if (value === 'BLOCK' || value === 'ENDSEC') {
            if (inside) return undefined;
            inside = true;
          } else if (value === 'ENDBLK') inside = false;
        }
        if (boundary && groups >= groupsPerChunk) {
          chunks.push({ section: state, start: chunkStart, end: at });
          chunkStart = at;
          groups = 0;
        }
      }
      groups += 1;
    }
    at = next;
  }
  if (state !== 'top' || at >= body.length) return undefined;
  let frame = '';
  let from = 0;
  for (const [start, end] of cuts) {
    frame += body.slice(from, start);
    from = end;
  }
  return { frame: frame + body.slice(from), chunks, types };
}

/** Index of the line terminator (\r\n, \r or \n, as dxf-parser splits) at or after `from`. */
function anyLineEnd(text: string, from: number): number {
  for (let i = from; i < text.length; i += 1) {
    const c = text.charCodeAt(i);
    if (c === 10 || c === 13) return i;
  }
  return text.length;
}

/** `anyLineEnd` for a text without \r. */
function newlineEnd(text: string, from: number): number {
  const end = text.indexOf('\n', from);
  return end < 0 ? text.length : end;
}

function nextLine(text: string, end: number): number {
  if (end >= text.length) return text.length + 1;
  return text.charCodeAt(end) === 13 && text.charCodeAt(end + 1) === 10 ? end + 2 : end + 1;
}

/** `parseInt(line) === 0`, as the parser reads group codes, without a string for most lines. */
function isCodeZero(text: string, start: number, end: number): boolean {
  let i = start;
  while (i < end && text.charCodeAt(i) === 32) i += 1;
  const c = text.charCodeAt(i);
  if (i < end && c >= 49 && c <= 57) return false;
  return parseInt(text.slice(start, end)) === 0;
}

function isEofValue(text: string, start: number, end: number): boolean {
  return end - start >= 3 && end - start <= 64 && text.slice(start, end).trim() === 'EOF';
}
