import { describe, expect, it } from 'vitest';
import { BoxGrid } from './box-grid';

describe('box grid', () => {
  it('returns every box that holds a point, among few others', () => {
    const boxes = Array.from({ length: 100 }, (_, i) => ({
      minX: (i % 10) * 10,
      minY: Math.floor(i / 10) * 10,
      maxX: (i % 10) * 10 + 5,
      maxY: Math.floor(i / 10) * 10 + 5,
    }));
    const sheet = { minX: -1, minY: -1, maxX: 101, maxY: 101 };
    const grid = new BoxGrid([...boxes, sheet]);
    const found = Array.from(grid.candidates(32, 72));
    expect(found).toContain(73);
    expect(found).toContain(100);
    expect(found.length).toBeLessThan(10);
    expect(found).toEqual([...found].sort((i, j) => i - j));
  });

  it('returns the boxes too large for the grid for every point, after those of the cell', () => {
    // 5000 boxes make a 71 × 71 grid; the sheet under them all would fill more than 4096 cells.
    const boxes = Array.from({ length: 5000 }, (_, i) => ({
      minX: (i % 70) * 10,
      minY: Math.floor(i / 70) * 10,
      maxX: (i % 70) * 10 + 5,
      maxY: Math.floor(i / 70) * 10 + 5,
    }));
    const sheet = { minX: -1, minY: -1, maxX: 701, maxY: 721 };
    const grid = new BoxGrid([...boxes, sheet]);
    expect(Array.from(grid.candidates(312, 72))).toEqual([...Array.from(grid.candidates(312, 72)).slice(0, -1), 5000]);
    expect(Array.from(grid.candidates(312, 72))).toContain(7 * 70 + 31);
    expect(Array.from(grid.candidates(700.5, 720.5))).toEqual([5000]);
  });
});
