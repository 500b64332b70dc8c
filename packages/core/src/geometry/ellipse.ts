import type { Vec } from './vec';

/** An ellipse or elliptical arc as DXF stores it: centre, major-axis end point relative to the centre. */
export interface EllipseArc {
  centre: Vec;
  majorAxis: Vec;
  /** Minor to major axis length. */
  ratio: number;
  /** Parameters (radians) of the start and end, running counter-clockwise. */
  startParameter: number;
  endParameter: number;
}

const TURN = 2 * Math.PI;

/** Parameter span counter-clockwise from start to end, in (0, 2π]. */
export function ellipseSweep(ellipse: EllipseArc): number {
  const span = (((ellipse.endParameter - ellipse.startParameter) % TURN) + TURN) % TURN;
  return span < 1e-12 ? TURN : span;
}

export function isFullEllipse(ellipse: EllipseArc): boolean {
  return Math.abs(ellipseSweep(ellipse) - TURN) < 1e-9;
}

/** Point at parameter t: centre + major·cos t + minor·sin t. */
export function ellipsePoint(ellipse: EllipseArc, t: number): Vec {
  const { centre, majorAxis, ratio } = ellipse;
  const cos = Math.cos(t);
  const sin = Math.sin(t);
  return {
    x: centre.x + majorAxis.x * cos - majorAxis.y * ratio * sin,
    y: centre.y + majorAxis.y * cos + majorAxis.x * ratio * sin,
  };
}

/**
 * Points from start to end (both included) with chords within `chordTolerance` of the curve:
 * the sagitta of a step Δt on the major radius a is about a·Δt²/8.
 */
export function sampleEllipse(ellipse: EllipseArc, chordTolerance: number): Vec[] {
  const sweep = ellipseSweep(ellipse);
  const a = Math.hypot(ellipse.majorAxis.x, ellipse.majorAxis.y);
  const step = Math.sqrt((8 * chordTolerance) / Math.max(a, 1e-12));
  const count = Math.min(2048, Math.max(8, Math.ceil(sweep / step)));
  const points: Vec[] = [];
  for (let i = 0; i <= count; i += 1) points.push(ellipsePoint(ellipse, ellipse.startParameter + (sweep * i) / count));
  return points;
}
