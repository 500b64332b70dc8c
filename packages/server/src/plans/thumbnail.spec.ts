import type { PointMm } from '@jigwright/core';
import { buildThumbnail, outlinesOfAnalysis, simplifyPolygon } from './thumbnail';

/** A circle of radius r drawn as n chords. */
function circle(cx: number, cy: number, r: number, n: number): PointMm[] {
  return Array.from({ length: n }, (_, i): PointMm => [
    cx + r * Math.cos((2 * Math.PI * i) / n),
    cy + r * Math.sin((2 * Math.PI * i) / n),
  ]);
}

describe('simplifyPolygon', () => {
  it('drops the vertices that lie on a straight edge', () => {
    const square: PointMm[] = [
      [0, 0],
      [50, 0],
      [100, 0],
      [100, 100],
      [0, 100],
      [0, 50],
    ];
    expect(simplifyPolygon(square, 0.1)).toEqual([
      [0, 0],
      [100, 0],
      [100, 100],
      [0, 100],
    ]);
  });

  it('keeps a curve within the tolerance with fewer points', () => {
    const points = circle(0, 0, 100, 360);
    const simplified = simplifyPolygon(points, 0.5);
    expect(simplified.length).toBeLessThan(60);
    expect(simplified.length).toBeGreaterThan(8);
    // Every kept vertex is on the circle; a chord's sagitta r(1 − cos(θ/2)) stays within the tolerance.
    for (const [x, y] of simplified) expect(Math.hypot(x, y)).toBeCloseTo(100, 6);
  });

  it('does not change its input', () => {
    const points = circle(0, 0, 10, 12);
    const copy = points.map((p) => [...p]);
    simplifyPolygon(points, 1);
    expect(points).toEqual(copy);
  });
});

describe('buildThumbnail', () => {
  it('is null for drawings without parts', () => {
    expect(buildThumbnail([])).toBeNull();
    expect(buildThumbnail([[]])).toBeNull();
  });

  it('moves the parts to the origin and puts a second drawing to the right of the first', () => {
    const first: PointMm[][] = [
      [
        [100, 200],
        [300, 200],
        [300, 300],
        [100, 300],
      ],
    ];
    const second: PointMm[][] = [
      [
        [-50, -50],
        [50, -50],
        [50, 50],
        [-50, 50],
      ],
    ];
    const thumbnail = buildThumbnail([first, second])!;
    // Height 100 mm, so the gap is 5 mm: the second drawing starts at 200 + 5.
    expect(thumbnail.outlines).toEqual([
      [
        [0, 0],
        [200, 0],
        [200, 100],
        [0, 100],
      ],
      [
        [205, 0],
        [305, 0],
        [305, 100],
        [205, 100],
      ],
    ]);
    expect(thumbnail.extents).toEqual({ min: [0, 0], max: [305, 100] });
  });
});

describe('outlinesOfAnalysis', () => {
  const square: PointMm[] = [
    [0, 0],
    [10, 0],
    [10, 10],
    [0, 10],
  ];
  const part = (instances: Array<{ centre: PointMm; angle: number }>) => ({
    outline: { points: square, path: [] },
    instances: instances.map((instance) => ({ ...instance, sources: [] })),
  });

  it('moves the first copy onto each other copy', () => {
    const outlines = outlinesOfAnalysis({
      parts: [
        part([
          { centre: [5, 5], angle: 0 },
          { centre: [105, 5], angle: 0 },
        ]),
      ],
    });
    expect(outlines).toEqual([
      square,
      [
        [100, 0],
        [110, 0],
        [110, 10],
        [100, 10],
      ],
    ]);
  });

  it('turns a copy drawn at another angle', () => {
    const [, turned] = outlinesOfAnalysis({
      parts: [
        part([
          { centre: [5, 5], angle: 0 },
          { centre: [5, 5], angle: 90 },
        ]),
      ],
    });
    // A quarter turn about the centre (5, 5) takes (0, 0) to (10, 0).
    expect(turned![0]![0]).toBeCloseTo(10, 9);
    expect(turned![0]![1]).toBeCloseTo(0, 9);
  });
});
