import { describe, expect, it } from 'vitest';
import { inchesToMm } from '../units/length';
import { cutBars, firstFitDecreasing } from './bar-cutting';

describe('cutting pieces from bars', () => {
  // REFERENCES.md, kerf [derived]: four 2 in strips with three cuts at 1/8 in need 8-3/8 in.
  it('four 2 in pieces with a 1/8 in kerf fit a bar of exactly 8-3/8 in, and not 8-5/16 in', () => {
    const pieces = Array.from({ length: 4 }, () => ({ name: 'strip', length: inchesToMm(2) }));
    expect(cutBars(pieces, { barLengths: [inchesToMm(8.375)], kerf: inchesToMm(1 / 8) }).bars).toHaveLength(1);
    expect(cutBars(pieces, { barLengths: [inchesToMm(8.3125)], kerf: inchesToMm(1 / 8) }).bars).toHaveLength(2);
  });

  it('places the pieces one kerf apart from the end trim', () => {
    const plan = cutBars(
      [
        { name: 'a', length: 500 },
        { name: 'b', length: 300 },
      ],
      { barLengths: [1000], kerf: 3, endTrim: 10 },
    );
    expect(plan.bars[0]?.pieces.map((p) => p.offset)).toEqual([10, 513]);
    expect(plan.bars[0]?.offcut).toBe(200);
  });

  it('picks the shortest bar on sale that holds a bar’s pieces', () => {
    const plan = cutBars([{ name: 'rail', length: 900 }], { barLengths: [3000, 1000, 2000], kerf: 3 });
    expect(plan.bars[0]?.length).toBe(1000);
  });

  it('reports pieces longer than every bar', () => {
    const plan = cutBars([{ name: 'long', length: 4000 }], { barLengths: [3000] });
    expect(plan.unplaced).toHaveLength(1);
    expect(plan.bars).toHaveLength(0);
  });

  // By hand [derived]: in bins of 10, FFD packs 5+4 | 3+3+3 | 2, while 5+3+2 | 4+3+3 fills two.
  it('beats first-fit decreasing where FFD wastes a bin', () => {
    const sizes = [5, 4, 3, 3, 3, 2];
    expect(firstFitDecreasing(sizes, 10)).toHaveLength(3);
    const plan = cutBars(
      sizes.map((length, i) => ({ name: `p${i}`, length })),
      { barLengths: [10] },
    );
    expect(plan.bars).toHaveLength(2);
  });

  it('does not mutate its input', () => {
    const pieces = [
      { name: 'a', length: 5 },
      { name: 'b', length: 7 },
    ];
    const copy = structuredClone(pieces);
    cutBars(pieces, { barLengths: [10], kerf: 1 });
    expect(pieces).toEqual(copy);
  });
});
