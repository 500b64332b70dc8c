import type { Vec } from './vec';

/** A NURBS curve in the plane, as a DXF SPLINE stores it. */
export interface Nurbs {
  degree: number;
  controlPoints: readonly Vec[];
  knots: readonly number[];
  /** One per control point; empty means all 1 (a non-rational B-spline). */
  weights: readonly number[];
}

/** Whether the knot vector fits the degree and control points (n + p + 1 knots, non-decreasing). */
export function isValidNurbs(curve: Nurbs): boolean {
  const n = curve.controlPoints.length;
  const p = curve.degree;
  if (p < 1 || n < p + 1 || curve.knots.length !== n + p + 1) return false;
  if (curve.weights.length !== 0 && curve.weights.length !== n) return false;
  for (let i = 1; i < curve.knots.length; i += 1)
    if ((curve.knots[i] as number) < (curve.knots[i - 1] as number)) return false;
  return (curve.knots[n] as number) > (curve.knots[p] as number);
}

/** Point at parameter u by de Boor's algorithm in homogeneous coordinates (Piegl & Tiller, A4.1). */
export function nurbsPoint(curve: Nurbs, u: number): Vec {
  const p = curve.degree;
  const knots = curve.knots;
  const n = curve.controlPoints.length;
  let span = p;
  while (span < n - 1 && u >= (knots[span + 1] as number)) span += 1;
  const xs: number[] = [];
  const ys: number[] = [];
  const ws: number[] = [];
  for (let j = 0; j <= p; j += 1) {
    const point = curve.controlPoints[span - p + j] as Vec;
    const w = curve.weights[span - p + j] ?? 1;
    xs.push(point.x * w);
    ys.push(point.y * w);
    ws.push(w);
  }
  for (let r = 1; r <= p; r += 1) {
    for (let j = p; j >= r; j -= 1) {
      const i = span - p + j;
      const left = knots[i] as number;
      const denominator = (knots[i + p - r + 1] as number) - left;
      const alpha = denominator === 0 ? 0 : (u - left) / denominator;
      xs[j] = (1 - alpha) * (xs[j - 1] as number) + alpha * (xs[j] as number);
      ys[j] = (1 - alpha) * (ys[j - 1] as number) + alpha * (ys[j] as number);
      ws[j] = (1 - alpha) * (ws[j - 1] as number) + alpha * (ws[j] as number);
    }
  }
  const w = ws[p] as number;
  return { x: (xs[p] as number) / w, y: (ys[p] as number) / w };
}

/** Points evenly spaced in parameter over the curve's domain, both ends included. */
export function sampleNurbs(curve: Nurbs, count: number): Vec[] {
  const low = curve.knots[curve.degree] as number;
  const high = curve.knots[curve.controlPoints.length] as number;
  const points: Vec[] = [];
  for (let i = 0; i <= count; i += 1) points.push(nurbsPoint(curve, low + ((high - low) * i) / count));
  return points;
}
