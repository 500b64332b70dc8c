import { describe, expect, it } from 'vitest';
import { parseThicknessToken } from './thickness-token';

describe('thickness tokens in layer names', () => {
  it.each([
    ['birch-ply-18mm', 18, 'birch-ply'],
    ['18mm', 18, ''],
    ['MDF 12.5mm', 12.5, 'MDF'],
    ['oak_3/4in', 19.05, 'oak'],
    ['oak 3/4"', 19.05, 'oak'],
    ['maple-1-1/2in-top', 38.1, 'maple-top'],
    ['walnut 0.75in', 19.05, 'walnut'],
    // Quarter thickness: 8/4 is 2 in of rough stock (trade usage, DESIGN.md §2).
    ['cherry 8/4', 50.8, 'cherry'],
  ])('%s → %f mm, material %s', (layer, thickness, rest) => {
    const token = parseThicknessToken(layer);
    expect(token?.thickness).toBeCloseTo(thickness, 9);
    expect(token?.rest).toBe(rest);
  });

  it.each(['0', 'fence', 'part18', 'mm', 'A4-sheet'])('%s has no thickness', (layer) => {
    expect(parseThicknessToken(layer)).toBeUndefined();
  });
});
