import type { DrawingUnits } from '../units/insunits';

/** A point in millimetres, [x, y]. */
export type PointMm = [number, number];

/** Where on the drawing something was measured: the DXF entity handle and its layer and block. */
export interface SourceRef {
  handle: string;
  layer: string;
  /** Innermost named block holding the entity, when it came through an INSERT. */
  block?: string;
}

/**
 * A closed outline in millimetres, given twice: `path` is the exact form (vertices with DXF bulges,
 * closed back to the first; ellipses and splines are already fine straight chords), `points` is a
 * polygon within 0.02 mm of the true curve, ready for SVG or a three.js Shape. Part outlines run
 * counter-clockwise, holes clockwise.
 */
export interface Outline {
  path: { x: number; y: number; bulge: number }[];
  points: PointMm[];
}

/** One copy of a part on the drawing. */
export interface PartInstance {
  /** Centre of its minimum-area rectangle. */
  centre: PointMm;
  /** Direction of its length, degrees counter-clockwise from +X, in [0, 180). */
  angle: number;
  /** Entities its outline was chained from. */
  sources: SourceRef[];
}

/** Identical parts (same name, same size within the tolerance) as one row. */
export interface AnalysedPart {
  name: string;
  nameSource: 'label' | 'block' | 'layer';
  layer: string;
  quantity: number;
  /** Longer side of the minimum-area enclosing rectangle, mm. */
  length: number;
  /** Shorter side of that rectangle, mm. */
  width: number;
  /** Outline minus holes, mm², arcs exact. */
  area: number;
  /** Outer outline only, mm, arcs exact. */
  perimeter: number;
  /** Number of holes. */
  holes: number;
  /** The first copy's outline and holes as drawn. */
  outline: Outline;
  holeOutlines: Outline[];
  instances: PartInstance[];
}

export type DimensionType = 'rotated' | 'aligned' | 'angular' | 'diameter' | 'radius' | 'angular-3-point' | 'ordinate';

export interface AnalysedDimension {
  type: DimensionType;
  /** Value in mm, or degrees for angular types. */
  measured: number;
  unit: 'mm' | 'deg';
  /** Whether `measured` came from group 42 or from the definition points. */
  measuredFrom: 'group-42' | 'definition-points';
  /** The text override as written (`<>` stands for the measured value); null when there is none. */
  text: string | null;
  /** Middle of the dimension text, mm. */
  at: PointMm | null;
  source: SourceRef;
}

export type WarningCode =
  | 'units-unknown'
  | 'units-overridden'
  | 'open-paths'
  | 'branching-paths'
  | 'z-flattened'
  | 'unknown-entities'
  | 'missing-block'
  | 'mesh-skipped'
  | 'stretched-arcs'
  | 'spline-approximated'
  | 'dimension-text-mismatch'
  | 'overlapping-outlines'
  | 'unsupported-extrusion';

export interface AnalysisWarning {
  code: WarningCode;
  message: string;
  /** Entities the warning is about, where it concerns particular ones. */
  sources?: SourceRef[];
}

/** Everything measured from one drawing; plain data, safe to store as JSON. All lengths mm, areas mm². */
export interface DrawingAnalysis {
  /** Units the drawing declares (or the caller supplied); `unknown` when neither did. */
  units: DrawingUnits;
  /** Millimetres per drawing unit used for every number below (1 when the units are unknown). */
  mmPerUnit: number;
  /** Box around all model-space geometry; null for a drawing without any. */
  extents: { min: PointMm; max: PointMm } | null;
  parts: AnalysedPart[];
  dimensions: AnalysedDimension[];
  warnings: AnalysisWarning[];
  /** Counts of the entities met after expanding inserts, by DXF type. */
  entities: { expanded: number; byType: Record<string, number>; unknown: Record<string, number> };
  /** Paths that do not close into an outline. */
  openPaths: number;
}
