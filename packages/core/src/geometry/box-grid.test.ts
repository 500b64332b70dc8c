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
    const found = grid.candidates({ x: 32, y: 72 });
    expect(found).toContain(73);
    expect(found).toContain(100);
    expect(found.length).toBeLessThan(10);
  });
});
