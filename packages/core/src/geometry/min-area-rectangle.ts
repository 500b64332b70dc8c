import type { Vec } from './vec';

/** The smallest-area rectangle around a set of points. */
export interface MinAreaRectangle {
  /** Longer side. */
  length: number;
  /** Shorter side. */
  width: number;
  /** Direction of the longer side, radians in [0, π). */
  angle: number;
  centre: Vec;
}

/**
 * Minimum-area enclosing rectangle of a convex hull (counter-clockwise): one side of the optimum
 * lies on a hull edge (Freeman & Shapira 1975), so every edge direction is tried, with the
 * extremes tracked by rotating calipers. Rectangles of the same area (within a tolerance scaled
 * to the hull) tie, as a right triangle's on a leg and on its hypotenuse do: the one with the
 * shorter perimeter wins, a property of the shape alone, so that a part measures the same at any
 * rotation and wherever its hull starts.
 */
export function minAreaRectangle(convexHull: readonly Vec[]): MinAreaRectangle {
  const flat: number[] = [];
  for (const p of convexHull) flat.push(p.x, p.y);
  return minAreaRectangleOfPairs(flat);
}

/** `minAreaRectangle` of a hull given as flat x, y pairs. */
export function minAreaRectangleOfPairs(convexHull: readonly number[]): MinAreaRectangle {
  const hull = withoutNearDuplicates(convexHull);
  const n = hull.length >> 1;
  if (n === 0) return { length: 0, width: 0, angle: 0, centre: { x: 0, y: 0 } };
  if (n < 3) return degenerateRectangle(hull);
  // Tolerances scale with the hull: fixed ones stall the calipers on a part a micron across.
  const tol = extentOf(hull) * 1e-12;
  const areaTol = tol * tol * 1e12;
  const perimeterTol = tol * 1e3;
  let bestArea = Infinity;
  let bestPerimeter = Infinity;
  let bestAngle = NaN;
  let u0 = 0;
  let u1 = 0;
  let v0 = 0;
  let v1 = 0;
  let right = 0;
  let top = 0;
  let left = 0;
  for (let i = 0; i < n; i += 1) {
    const j = (i + 1) % n;
    const dx = (hull[2 * j] as number) - (hull[2 * i] as number);
    const dy = (hull[2 * j + 1] as number) - (hull[2 * i + 1] as number);
    const len = Math.hypot(dx, dy);
    if (len === 0) continue;
    const ux = dx / len;
    const uy = dy / len;
    // Calipers only move forward: the extreme vertices turn with the edge direction. Each keeps
    // its projection, so that a step computes only the next vertex's.
    right = Math.max(right, i);
    let highU = along(hull, right % n, ux, uy);
    for (let next = along(hull, (right + 1) % n, ux, uy); next > highU + tol;) {
      right += 1;
      highU = next;
      next = along(hull, (right + 1) % n, ux, uy);
    }
    top = Math.max(top, right);
    let highV = along(hull, top % n, -uy, ux);
    for (let next = along(hull, (top + 1) % n, -uy, ux); next > highV + tol;) {
      top += 1;
      highV = next;
      next = along(hull, (top + 1) % n, -uy, ux);
    }
    left = Math.max(left, top);
    let lowU = along(hull, left % n, ux, uy);
    for (let next = along(hull, (left + 1) % n, ux, uy); next < lowU - tol;) {
      left += 1;
      lowU = next;
      next = along(hull, (left + 1) % n, ux, uy);
    }
    const lowV = along(hull, i, -uy, ux);
    const area = (highU - lowU) * (highV - lowV);
    const halfPerimeter = highU - lowU + (highV - lowV);
    const tie = area <= bestArea + areaTol;
    if (Number.isNaN(bestAngle) || area < bestArea - areaTol || (tie && halfPerimeter < bestPerimeter - perimeterTol)) {
      bestArea = area;
      bestPerimeter = halfPerimeter;
      bestAngle = Math.atan2(uy, ux);
      u0 = lowU;
      u1 = highU;
      v0 = lowV;
      v1 = highV;
    }
  }
  if (Number.isNaN(bestAngle)) return degenerateRectangle(hull);
  return rectangleFromRanges(bestAngle, [u0, u1], [v0, v1]);
}

// Calipers stall on plateaus made by hull vertices a rounding error apart, so those go first.
function withoutNearDuplicates(hull: readonly number[]): number[] {
  let size = 0;
  for (const v of hull) size = Math.max(size, Math.abs(v));
  const eps = size * 1e-9;
  const kept: number[] = [];
  for (let i = 0; i + 1 < hull.length; i += 2) {
    const x = hull[i] as number;
    const y = hull[i + 1] as number;
    const k = kept.length;
    if (k === 0 || Math.abs(x - (kept[k - 2] as number)) > eps || Math.abs(y - (kept[k - 1] as number)) > eps)
      kept.push(x, y);
  }
  const k = kept.length;
  if (
    k > 2 &&
    Math.abs((kept[0] as number) - (kept[k - 2] as number)) <= eps &&
    Math.abs((kept[1] as number) - (kept[k - 1] as number)) <= eps
  )
    kept.length = k - 2;
  return kept;
}

/** The larger of the hull's extents along x and y. */
function extentOf(hull: readonly number[]): number {
  let minX = Infinity;
  let maxX = -Infinity;
  let minY = Infinity;
  let maxY = -Infinity;
  for (let i = 0; i + 1 < hull.length; i += 2) {
    const x = hull[i] as number;
    const y = hull[i + 1] as number;
    if (x < minX) minX = x;
    if (x > maxX) maxX = x;
    if (y < minY) minY = y;
    if (y > maxY) maxY = y;
  }
  return Math.max(maxX - minX, maxY - minY);
}

/** Projection of the hull's vertex k on the direction (ux, uy). */
function along(hull: readonly number[], k: number, ux: number, uy: number): number {
  return (hull[2 * k] as number) * ux + (hull[2 * k + 1] as number) * uy;
}

function rectangleFromRanges(angle: number, u: [number, number], v: [number, number]): MinAreaRectangle {
  const sideU = u[1] - u[0];
  const sideV = v[1] - v[0];
  const cu = (u[0] + u[1]) / 2;
  const cv = (v[0] + v[1]) / 2;
  const cos = Math.cos(angle);
  const sin = Math.sin(angle);
  const centre = { x: cu * cos - cv * sin, y: cu * sin + cv * cos };
  const lengthAngle = sideU >= sideV ? angle : angle + Math.PI / 2;
  return {
    length: Math.max(sideU, sideV),
    width: Math.min(sideU, sideV),
    angle: normaliseHalfTurn(lengthAngle),
    centre,
  };
}

function degenerateRectangle(points: readonly number[]): MinAreaRectangle {
  const p = { x: points[0] as number, y: points[1] as number };
  const q = { x: points[points.length - 2] as number, y: points[points.length - 1] as number };
  return {
    length: Math.hypot(q.x - p.x, q.y - p.y),
    width: 0,
    angle: normaliseHalfTurn(Math.atan2(q.y - p.y, q.x - p.x)),
    centre: { x: (p.x + q.x) / 2, y: (p.y + q.y) / 2 },
  };
}

/** An angle folded into [0, π): a rectangle's side has no sense of direction. */
export function normaliseHalfTurn(angle: number): number {
  const folded = ((angle % Math.PI) + Math.PI) % Math.PI;
  return Math.PI - folded < 1e-9 ? 0 : folded;
}
