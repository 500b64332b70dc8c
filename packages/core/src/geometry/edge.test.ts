import { describe, expect, it } from 'vitest';
import { scaling } from './affine';
import { edgeAreaTerm, edgeBounds, edgeLength, reverseEdge, sampleEdge, transformEdge, type Edge } from './edge';

const semicircleTop: Edge = { a: { x: 1, y: 0 }, b: { x: -1, y: 0 }, bulge: 1 };
const semicircleBottom: Edge = { a: { x: -1, y: 0 }, b: { x: 1, y: 0 }, bulge: 1 };

describe('edges', () => {
  // A unit circle as two bulge-1 semicircles: area π r², circumference 2π r (Euclid; exact).
  it('two semicircles make a unit circle with exact area and length', () => {
    const area = edgeAreaTerm(semicircleTop) + edgeAreaTerm(semicircleBottom);
    expect(area).toBeCloseTo(Math.PI, 12);
    expect(edgeLength(semicircleTop) + edgeLength(semicircleBottom)).toBeCloseTo(2 * Math.PI, 12);
  });

  it('reversing an edge negates its area share', () => {
    expect(edgeAreaTerm(reverseEdge(semicircleTop))).toBeCloseTo(-edgeAreaTerm(semicircleTop), 12);
  });

  it('the bounds of an arc include its quadrant points', () => {
    const box = edgeBounds(semicircleTop);
    expect(box.maxY).toBeCloseTo(1, 12);
    expect(box.minY).toBeCloseTo(0, 12);
    expect(box.minX).toBeCloseTo(-1, 12);
  });

  it('sampled arc points lie on the circle and the chords stay within the tolerance', () => {
    const points = sampleEdge({ a: { x: 100, y: 0 }, b: { x: -100, y: 0 }, bulge: 1 }, 0.02);
    for (const p of points) expect(Math.hypot(p.x, p.y)).toBeCloseTo(100, 9);
    const step = Math.PI / points.length;
    expect(100 * (1 - Math.cos(step / 2))).toBeLessThanOrEqual(0.02 + 1e-9);
  });

  it('a mirror reverses the bulge and a stretch turns the arc into chords', () => {
    const mirrored = transformEdge(semicircleTop, scaling(-1, 1));
    expect(mirrored).toHaveLength(1);
    expect(mirrored[0]?.bulge).toBe(-1);
    const stretched = transformEdge(semicircleTop, scaling(2, 1));
    expect(stretched.length).toBeGreaterThan(4);
    expect(stretched.every((edge) => edge.bulge === 0)).toBe(true);
  });

  it('does not mutate the edge it transforms', () => {
    const edge: Edge = { a: { x: 1, y: 2 }, b: { x: 3, y: 4 }, bulge: 0.5 };
    const copy = structuredClone(edge);
    transformEdge(edge, scaling(2, 3));
    reverseEdge(edge);
    expect(edge).toEqual(copy);
  });
});
