import { parseInchFraction } from './inch-fraction';
import { MM_PER_INCH } from './length';

export interface ThicknessToken {
  /** Thickness in millimetres. */
  thickness: number;
  /** The layer name with the token and its separators removed, e.g. "birch-ply" from "birch-ply-18mm". */
  rest: string;
}

// Tokens as designers put them in layer names: 18mm, 12.5mm, 3/4in, 3/4", 1-1/2in, 0.75in, and the
// hardwood quarter form 4/4 … 16/4 (thickness in quarters of an inch, rough).
const TOKEN =
  /(?:^|[\s_\-.])((\d+(?:[.,]\d+)?)\s*mm|((?:\d+-)?\d+\/\d+|\d+(?:\.\d+)?)\s*(?:in|inch|")|(\d{1,2})\/4)(?=$|[\s_\-.])/i;

/** Finds a thickness token in a layer name; undefined when there is none. */
export function parseThicknessToken(layer: string): ThicknessToken | undefined {
  const match = TOKEN.exec(layer);
  if (!match || match[1] === undefined) return undefined;
  const thickness = tokenThickness(match);
  if (thickness === undefined || thickness <= 0) return undefined;
  const start = match.index + match[0].indexOf(match[1]);
  const rest = (layer.slice(0, start) + layer.slice(start + match[1].length))
    .replace(/[\s_\-.]+$/, '')
    .replace(/^[\s_\-.]+/, '')
    .replace(/([\s_\-.])[\s_\-.]+/g, '$1');
  return { thickness, rest };
}

function tokenThickness(match: RegExpExecArray): number | undefined {
  if (match[2] !== undefined) return Number(match[2].replace(',', '.'));
  if (match[3] !== undefined) return parseInchFraction(match[3]);
  if (match[4] !== undefined) return (Number(match[4]) / 4) * MM_PER_INCH;
  return undefined;
}
