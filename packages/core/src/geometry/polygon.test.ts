import { describe, expect, it } from 'vitest';
import { pointInPolygon, polygonSignedArea } from './polygon';

const square = [0, 0, 10, 0, 10, 10, 0, 10];
const clockwise = [0, 0, 0, 10, 10, 10, 10, 0];

describe('polygons', () => {
  it('a 10 × 10 square counter-clockwise has area +100, clockwise −100', () => {
    expect(polygonSignedArea(square)).toBe(100);
    expect(polygonSignedArea(clockwise)).toBe(-100);
  });

  it('tells inside from outside', () => {
    expect(pointInPolygon(5, 5, square)).toBe(true);
    expect(pointInPolygon(15, 5, square)).toBe(false);
    expect(pointInPolygon(-0.001, 5, square)).toBe(false);
  });
});
