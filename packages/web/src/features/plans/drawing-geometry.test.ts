import { describe, expect, it } from 'vitest';
import { drawingPicture, gridStepFor, panViewBox, zoomViewBox } from './drawing-geometry';
import { analyseDemoDrawing } from './test-drawings';

describe('the drawing picture', () => {
  const analysis = analyseDemoDrawing('five-cut-crosscut-sled/r1/sled.dxf');
  const picture = drawingPicture(analysis);

  it('draws one path per copy of every part', () => {
    const copies = analysis.parts.reduce((sum, part) => sum + part.instances.length, 0);
    expect(picture.parts).toHaveLength(copies);
    expect(copies).toBeGreaterThan(analysis.parts.length - 1);
  });

  it('puts each hole in its part’s path, so even-odd filling leaves it open', () => {
    const holed = analysis.parts.find((part) => part.holes > 0) ?? analysis.parts[0]!;
    const path = picture.parts.find((part) => part.name === holed.name && part.copy === 0)!.path;
    expect(path.match(/M /g)).toHaveLength(1 + holed.holes);
  });

  it('flips y so the drawing reads y up, and frames every part', () => {
    const { min, max } = analysis.extents!;
    const { viewBox } = picture;
    expect(viewBox.x).toBeLessThan(min[0]);
    expect(viewBox.x + viewBox.width).toBeGreaterThan(max[0]);
    // SVG y = −drawing y: the drawing's top edge is the smallest SVG y.
    expect(viewBox.y).toBeLessThan(-max[1]);
    expect(viewBox.y + viewBox.height).toBeGreaterThan(-min[1]);
  });

  it('draws a length and a width line for every part, as measured', () => {
    for (const part of analysis.parts) {
      const lines = picture.dimensions.filter((line) => line.partName === part.name);
      expect(lines.map((line) => line.mm)).toEqual([part.length, part.width]);
      const [length] = lines;
      const drawn = Math.hypot(length!.to[0] - length!.from[0], length!.to[1] - length!.from[1]);
      expect(drawn).toBeCloseTo(part.length, 6);
    }
  });

  it('places a copy at its own centre', () => {
    const arrayed = analysis.parts.find((part) => part.instances.length > 1);
    if (!arrayed) throw new Error('the sled drawing has arrayed parts');
    const second = picture.parts.find((part) => part.name === arrayed.name && part.copy === 1)!;
    const xs = [...second.path.matchAll(/(-?[\d.]+) (-?[\d.]+)/g)].map((m) => Number(m[1]));
    const middle = (Math.min(...xs) + Math.max(...xs)) / 2;
    expect(middle).toBeCloseTo(arrayed.instances[1]!.centre[0], 0);
  });

  it('shows dimension entities of the drawing at their text', () => {
    const withDimension = {
      ...analysis,
      dimensions: [
        {
          type: 'rotated' as const,
          measured: 150,
          unit: 'mm' as const,
          measuredFrom: 'group-42' as const,
          text: null,
          at: [10, 20] as [number, number],
          source: { handle: '1F', layer: 'DIM' },
        },
      ],
    };
    const line = drawingPicture(withDimension).dimensions.find((d) => d.partName === null)!;
    expect(line).toMatchObject({ mm: 150, at: [10, -20] });
  });
});

describe('the view box', () => {
  const box = { x: 0, y: 0, width: 200, height: 100 };

  it('zooms about a point that stays put', () => {
    const zoomed = zoomViewBox(box, 0.5, [50, 50]);
    expect(zoomed).toEqual({ x: 25, y: 25, width: 100, height: 50 });
    // The focus sits at the same fraction of the box before and after.
    expect((50 - zoomed.x) / zoomed.width).toBe((50 - box.x) / box.width);
  });

  it('pans without changing the scale', () => {
    expect(panViewBox(box, 10, -5)).toEqual({ x: 10, y: -5, width: 200, height: 100 });
  });

  it('picks a round grid step near a twentieth of the size', () => {
    expect(gridStepFor(800)).toBe(50);
    expect(gridStepFor(1000)).toBe(50);
    expect(gridStepFor(2440)).toBe(250);
    expect(gridStepFor(90)).toBe(5);
  });
});
