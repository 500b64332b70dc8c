import type { AnalysedPart, PointMm } from '@jigwright/core';

/** One piece on the 3D bench: its rings flat in its own frame (length along x) and where it lies. */
export interface BenchPiece {
  key: string;
  name: string;
  outline: PointMm[];
  holes: PointMm[][];
  thickness: number;
  /** Centre of the piece on the bench, mm: x to the right, y away from the viewer. */
  position: PointMm;
  length: number;
  width: number;
}

export interface BenchLayout {
  pieces: BenchPiece[];
  /** Size of the area the pieces cover, mm. */
  size: PointMm;
}

type DrawnPart = Pick<
  AnalysedPart,
  'name' | 'quantity' | 'length' | 'width' | 'outline' | 'holeOutlines' | 'instances'
>;

/** Turns rings so the part's length runs along x with the centre of its rectangle at the origin. */
function squareUp(ring: readonly PointMm[], centre: PointMm, angle: number): PointMm[] {
  const r = (-angle * Math.PI) / 180;
  const [cos, sin] = [Math.cos(r), Math.sin(r)];
  return ring.map(([x, y]) => {
    const [dx, dy] = [x - centre[0], y - centre[1]];
    return [dx * cos - dy * sin, dx * sin + dy * cos];
  });
}

/**
 * Every copy of every part squared up and laid side by side in rows, a gap apart, largest
 * first, rows no longer than the longest part or a square's side of the total area, whichever is more.
 */
export function benchLayout(
  parts: readonly DrawnPart[],
  thicknessOf: (name: string) => number,
  { gap = 20 }: { gap?: number } = {},
): BenchLayout {
  const shapes = parts.flatMap((part) => {
    const first = part.instances[0];
    const centre = first?.centre ?? [0, 0];
    const angle = first?.angle ?? 0;
    const outline = squareUp(part.outline.points, centre, angle);
    const holes = part.holeOutlines.map((hole) => squareUp(hole.points, centre, angle));
    return Array.from({ length: part.quantity }, (_, copy) => ({
      key: `${part.name}-${copy}`,
      name: part.name,
      outline,
      holes,
      thickness: thicknessOf(part.name),
      length: part.length,
      width: part.width,
    }));
  });
  const ordered = [...shapes].sort((a, b) => b.length * b.width - a.length * a.width);
  const area = shapes.reduce((sum, s) => sum + (s.length + gap) * (s.width + gap), 0);
  const rowLimit = Math.max(Math.sqrt(area), ...shapes.map((s) => s.length));
  const pieces: BenchPiece[] = [];
  let [x, y, rowDepth, widest] = [0, 0, 0, 0];
  for (const shape of ordered) {
    if (x > 0 && x + shape.length > rowLimit) {
      y += rowDepth + gap;
      [x, rowDepth] = [0, 0];
    }
    pieces.push({ ...shape, position: [x + shape.length / 2, y + shape.width / 2] });
    x += shape.length + gap;
    rowDepth = Math.max(rowDepth, shape.width);
    widest = Math.max(widest, x - gap);
  }
  return { pieces, size: [widest, y + rowDepth] };
}
