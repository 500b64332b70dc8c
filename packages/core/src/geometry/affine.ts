import type { Vec } from './vec';

/** A 2D affine transform: x' = a·x + c·y + e, y' = b·x + d·y + f. */
export interface Affine {
  a: number;
  b: number;
  c: number;
  d: number;
  e: number;
  f: number;
}

export const IDENTITY: Affine = { a: 1, b: 0, c: 0, d: 1, e: 0, f: 0 };

/** The transform that applies `inner` first, then `outer`. */
export function compose(outer: Affine, inner: Affine): Affine {
  return {
    a: outer.a * inner.a + outer.c * inner.b,
    b: outer.b * inner.a + outer.d * inner.b,
    c: outer.a * inner.c + outer.c * inner.d,
    d: outer.b * inner.c + outer.d * inner.d,
    e: outer.a * inner.e + outer.c * inner.f + outer.e,
    f: outer.b * inner.e + outer.d * inner.f + outer.f,
  };
}

export function translation(x: number, y: number): Affine {
  return { a: 1, b: 0, c: 0, d: 1, e: x, f: y };
}

export function rotation(radians: number): Affine {
  const cos = Math.cos(radians);
  const sin = Math.sin(radians);
  return { a: cos, b: sin, c: -sin, d: cos, e: 0, f: 0 };
}

export function scaling(sx: number, sy: number): Affine {
  return { a: sx, b: 0, c: 0, d: sy, e: 0, f: 0 };
}

export function apply(t: Affine, p: Vec): Vec {
  return { x: applyX(t, p.x, p.y), y: applyY(t, p.x, p.y) };
}

/** x' of the point (x, y): `apply` without a point object, for edges kept as plain numbers. */
export function applyX(t: Affine, x: number, y: number): number {
  return t.a * x + t.c * y + t.e;
}

/** y' of the point (x, y). */
export function applyY(t: Affine, x: number, y: number): number {
  return t.b * x + t.d * y + t.f;
}

export function determinant(t: Affine): number {
  return t.a * t.d - t.b * t.c;
}

/** Scale factor of a similarity transform (rotation, uniform scale, mirror), else undefined. */
export function uniformScale(t: Affine): number | undefined {
  const sx = Math.hypot(t.a, t.b);
  const sy = Math.hypot(t.c, t.d);
  const skew = t.a * t.c + t.b * t.d;
  const size = Math.max(sx, sy);
  if (size === 0) return undefined;
  return Math.abs(sx - sy) <= 1e-9 * size && Math.abs(skew) <= 1e-9 * size * size ? sx : undefined;
}
