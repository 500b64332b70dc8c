/** Plain-text helpers shared by the exports, which end up on controllers that take ASCII only. */

/** `value` with `digits` decimals, never "-0.000". */
export function fixed(value: number, digits: number): string {
  const text = value.toFixed(digits);
  return Number(text) === 0 ? (0).toFixed(digits) : text;
}

/** A number as short as it can be written without float noise (12.700000000000001 → 12.7). */
export function plain(value: number): string {
  return String(Number(value.toPrecision(12)));
}

const ASCII_REPLACEMENTS: ReadonlyArray<readonly [RegExp, string]> = [
  [/§/g, 'clause '],
  [/°/g, ' deg'],
  [/[‘’]/g, "'"],
  [/[“”]/g, '"'],
  [/[–—]/g, '-'],
  [/[^\x20-\x7E]/g, ''],
];

export function toAscii(text: string): string {
  return ASCII_REPLACEMENTS.reduce((result, [pattern, replacement]) => result.replace(pattern, replacement), text);
}

/** Splits `text` into lines of at most `width` characters at spaces (a longer word stays whole). */
export function wrapWords(text: string, width: number): string[] {
  return text
    .split(/\s+/)
    .filter((word) => word.length > 0)
    .reduce<string[]>((lines, word) => {
      const last = lines.at(-1);
      return last !== undefined && last.length + 1 + word.length <= width
        ? [...lines.slice(0, -1), `${last} ${word}`]
        : [...lines, word];
    }, []);
}
