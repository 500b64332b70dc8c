import { describe, expect, it } from 'vitest';
import { pointInPolygon, polygonSignedArea } from './polygon';

const square = [
  { x: 0, y: 0 },
  { x: 10, y: 0 },
  { x: 10, y: 10 },
  { x: 0, y: 10 },
];

describe('polygons', () => {
  it('a 10 × 10 square counter-clockwise has area +100, clockwise −100', () => {
    expect(polygonSignedArea(square)).toBe(100);
    expect(polygonSignedArea([...square].reverse())).toBe(-100);
  });

  it('tells inside from outside', () => {
    expect(pointInPolygon({ x: 5, y: 5 }, square)).toBe(true);
    expect(pointInPolygon({ x: 15, y: 5 }, square)).toBe(false);
    expect(pointInPolygon({ x: -0.001, y: 5 }, square)).toBe(false);
  });
});
