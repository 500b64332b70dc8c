/** Outline shapes as LWPOLYLINE vertices (mm or inches, whatever the drawing's units are). */
export interface Vertex {
  x: number;
  y: number;
  /** DXF bulge of the segment that starts here: tan(included angle / 4), positive counter-clockwise. */
  bulge: number;
}

export interface Placement {
  x?: number;
  y?: number;
  /** Degrees counter-clockwise. */
  angle?: number;
}

const QUARTER_BULGE = Math.tan(Math.PI / 8);

/** A rectangle with its corner at the origin, corners rounded to `radius` by bulges (0 = square). */
export function roundedRectangle(length: number, width: number, radius = 0): Vertex[] {
  if (radius <= 0) {
    return [
      { x: 0, y: 0, bulge: 0 },
      { x: length, y: 0, bulge: 0 },
      { x: length, y: width, bulge: 0 },
      { x: 0, y: width, bulge: 0 },
    ];
  }
  const r = Math.min(radius, length / 2, width / 2);
  return [
    { x: r, y: 0, bulge: 0 },
    { x: length - r, y: 0, bulge: QUARTER_BULGE },
    { x: length, y: r, bulge: 0 },
    { x: length, y: width - r, bulge: QUARTER_BULGE },
    { x: length - r, y: width, bulge: 0 },
    { x: r, y: width, bulge: QUARTER_BULGE },
    { x: 0, y: width - r, bulge: 0 },
    { x: 0, y: r, bulge: QUARTER_BULGE },
  ];
}

/** A slot (stadium) of overall `length` and `width`, centred on the origin along X. */
export function slot(length: number, width: number): Vertex[] {
  const half = (length - width) / 2;
  const r = width / 2;
  return [
    { x: -half, y: -r, bulge: 0 },
    { x: half, y: -r, bulge: 1 },
    { x: half, y: r, bulge: 0 },
    { x: -half, y: r, bulge: 1 },
  ];
}

/** The vertices rotated about the origin, then moved; bulges are unchanged by a rotation. */
export function place(vertices: readonly Vertex[], placement: Placement): Vertex[] {
  const angle = ((placement.angle ?? 0) * Math.PI) / 180;
  const cos = Math.cos(angle);
  const sin = Math.sin(angle);
  return vertices.map((v) => ({
    x: (placement.x ?? 0) + v.x * cos - v.y * sin,
    y: (placement.y ?? 0) + v.x * sin + v.y * cos,
    bulge: v.bulge,
  }));
}

/** A point rotated and moved like `place` moves outlines. */
export function placePoint(x: number, y: number, placement: Placement): { x: number; y: number } {
  const [v] = place([{ x, y, bulge: 0 }], placement);
  return { x: v?.x ?? 0, y: v?.y ?? 0 };
}
