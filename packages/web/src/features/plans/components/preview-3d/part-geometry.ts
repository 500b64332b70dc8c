import type { PointMm } from '@jigwright/core';
import { ExtrudeGeometry, Path, Shape, Vector2 } from 'three';
import type { BenchPiece } from './scene-layout';

const vectors = (ring: readonly PointMm[]) => ring.map(([x, y]) => new Vector2(x, y));

/** The piece's outline as a three.js shape, each hole cut out of it. */
export function pieceShape(piece: Pick<BenchPiece, 'outline' | 'holes'>): Shape {
  const shape = new Shape(vectors(piece.outline));
  shape.holes = piece.holes.map((hole) => new Path(vectors(hole)));
  return shape;
}

/** The piece extruded to its thickness, square edges, from z = 0 up. */
export function pieceGeometry(piece: Pick<BenchPiece, 'outline' | 'holes' | 'thickness'>): ExtrudeGeometry {
  return new ExtrudeGeometry(pieceShape(piece), { depth: piece.thickness, bevelEnabled: false, curveSegments: 1 });
}
