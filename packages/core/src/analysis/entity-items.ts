import type {
  IArcEntity,
  ICircleEntity,
  IDimensionEntity,
  IEllipseEntity,
  IEntity,
  IInsertEntity,
  ILineEntity,
  ILwpolylineEntity,
  IMtextEntity,
  IPoint,
  IPolylineEntity,
  ITextEntity,
} from 'dxf-parser';
import { isUnknownEntity, type WeightedSplineEntity } from '../dxf/entity-handlers';
import { applyX, applyY, IDENTITY, scaling, type Affine } from '../geometry/affine';
import { bulgeFromSweep } from '../geometry/bulge';
import { pushChordsThrough } from '../geometry/edge';
import type { EdgeRange, EdgeStore } from '../geometry/edge-store';
import { isFullEllipse, sampleEllipse } from '../geometry/ellipse';
import { isValidNurbs, sampleNurbs } from '../geometry/nurbs';
import type { Vec } from '../geometry/vec';
import type { WarningCode } from './types';

/** A warning an entity gives wherever it is inserted; the insert adds the source. */
export interface EntityNote {
  code: WarningCode;
  message: string;
}

interface ItemBase {
  /** DXF entity type, for the counts by type. */
  type: string;
  handle: string;
  /** The entity's own layer ('0' when it names none). */
  layer: string;
  notes: EntityNote[] | undefined;
}

/**
 * One model-space or block entity in the compact form the analysis keeps instead of the parser's
 * objects: its edges (a range of the analysis' edge store), a label, or a reference, in the
 * entity's own drawing units.
 */
export type FlatItem =
  | (ItemBase & { kind: 'piece'; range: EdgeRange; closed: boolean })
  | (ItemBase & { kind: 'text'; text: string; at: Vec })
  | (ItemBase & { kind: 'dimension'; entity: IDimensionEntity })
  | (ItemBase & { kind: 'insert'; insert: IInsertEntity })
  | (ItemBase & { kind: 'unknown' })
  | (ItemBase & { kind: 'other' });

/** A block definition as items, with the base point its inserts place at their insertion point. */
export interface FlatBlock {
  base: Vec;
  items: FlatItem[];
}

export interface ItemOptions {
  /** Largest gap between an ellipse and its chords, in drawing units. */
  chordTolerance: number;
  /** Where the items' edges are appended. */
  edges: EdgeStore;
}

const TURN = 2 * Math.PI;

/** The items of a list of parsed entities; paper-space entities are left out. */
export function entityItems(entities: readonly IEntity[], options: ItemOptions): FlatItem[] {
  const items: FlatItem[] = [];
  for (const entity of entities) if (!entity.inPaperSpace) items.push(entityItem(entity, options));
  return items;
}

export function entityItem(entity: IEntity, options: ItemOptions): FlatItem {
  const type = entity.type;
  const handle = String(entity.handle ?? '');
  const layer = entity.layer ?? '0';
  const found: EntityNote[] = [];
  if (isUnknownEntity(entity)) return { kind: 'unknown', type, handle, layer, notes: undefined };
  const store = options.edges;
  let geometry: [EdgeRange, boolean] | undefined;
  switch (entity.type) {
    case 'INSERT':
      return { kind: 'insert', type, handle, layer, notes: undefined, insert: entity as IInsertEntity };
    case 'LINE': {
      const [a, b] = (entity as ILineEntity).vertices ?? [];
      if (a && b) geometry = [{ start: store.push(a.x, a.y, b.x, b.y, 0), end: store.count }, false];
      break;
    }
    case 'ARC':
    case 'CIRCLE':
      geometry = circularEdges(entity as IArcEntity, found, store);
      break;
    case 'LWPOLYLINE':
      geometry = lwpolylineEdges(entity as ILwpolylineEntity, found, store);
      break;
    case 'POLYLINE':
      geometry = polylineEdges(entity as IPolylineEntity, found, store);
      break;
    case 'ELLIPSE':
      geometry = ellipseEdges(entity as IEllipseEntity, options.chordTolerance, store);
      break;
    case 'SPLINE':
      geometry = splineEdges(entity as unknown as WeightedSplineEntity, found, store);
      break;
    case 'TEXT':
    case 'MTEXT': {
      const label = labelOf(entity);
      if (label) return { kind: 'text', type, handle, layer, notes: undefined, text: label.text, at: label.at };
      break;
    }
    case 'DIMENSION':
      return { kind: 'dimension', type, handle, layer, notes: undefined, entity: entity as IDimensionEntity };
    default:
      break;
  }
  const notes = found.length > 0 ? found : undefined;
  if (geometry && geometry[0].end > geometry[0].start)
    return { kind: 'piece', type, handle, layer, notes, range: geometry[0], closed: geometry[1] };
  return { kind: 'other', type, handle, layer, notes };
}

function xy(p: IPoint): Vec {
  return { x: p.x, y: p.y };
}

/** OCS with extrusion (0, 0, −1), the usual way CAD programs mirror 2D entities, flips X. */
function ocsMirror(entity: IEntity, notes: EntityNote[]): Affine {
  const e = entity as Partial<{
    extrusionDirectionX: number;
    extrusionDirectionY: number;
    extrusionDirectionZ: number;
    extrusionDirection: IPoint;
  }>;
  const x = e.extrusionDirectionX ?? e.extrusionDirection?.x ?? 0;
  const y = e.extrusionDirectionY ?? e.extrusionDirection?.y ?? 0;
  const z = e.extrusionDirectionZ ?? e.extrusionDirection?.z ?? 1;
  if (Math.abs(x) > 1e-9 || Math.abs(y) > 1e-9) {
    notes.push({
      code: 'unsupported-extrusion',
      message: 'entities drawn in a tilted plane were projected as if flat',
    });
  }
  return z < 0 ? scaling(-1, 1) : IDENTITY;
}

function circularEdges(
  entity: IArcEntity | ICircleEntity,
  notes: EntityNote[],
  store: EdgeStore,
): [EdgeRange, boolean] {
  const centre = entity.center ?? { x: 0, y: 0, z: 0 };
  const r = entity.radius ?? 0;
  const start = store.count;
  if (!(r > 0)) return [{ start, end: start }, false];
  const mirror = ocsMirror(entity, notes);
  const flip = mirror === IDENTITY ? 1 : -1;
  if (entity.type === 'CIRCLE') {
    // The two quadrant points exactly, not through cos(π) and sin(π).
    const ex = applyX(mirror, centre.x + r, centre.y);
    const ey = applyY(mirror, centre.x + r, centre.y);
    const wx = applyX(mirror, centre.x - r, centre.y);
    const wy = applyY(mirror, centre.x - r, centre.y);
    store.push(ex, ey, wx, wy, flip);
    store.push(wx, wy, ex, ey, flip);
    return [{ start, end: store.count }, true];
  }
  const from = entity.startAngle ?? 0;
  let sweep = ((((entity.endAngle ?? TURN) - from) % TURN) + TURN) % TURN;
  if (sweep < 1e-12) sweep = TURN;
  if (sweep >= TURN - 1e-9) {
    const [px, py] = onCircle(mirror, centre, r, from);
    const [qx, qy] = onCircle(mirror, centre, r, from + Math.PI);
    store.push(px, py, qx, qy, flip);
    store.push(qx, qy, px, py, flip);
    return [{ start, end: store.count }, true];
  }
  const [px, py] = onCircle(mirror, centre, r, from);
  const [qx, qy] = onCircle(mirror, centre, r, from + sweep);
  store.push(px, py, qx, qy, flip * bulgeFromSweep(sweep));
  return [{ start, end: store.count }, false];
}

function onCircle(mirror: Affine, centre: IPoint, r: number, angle: number): [number, number] {
  const x = centre.x + r * Math.cos(angle);
  const y = centre.y + r * Math.sin(angle);
  return [applyX(mirror, x, y), applyY(mirror, x, y)];
}

function verticesToEdges(
  vertices: readonly { x: number; y: number; bulge?: number }[],
  closed: boolean,
  mirror: Affine,
  store: EdgeStore,
): EdgeRange {
  const flip = mirror === IDENTITY ? 1 : -1;
  const start = store.count;
  const count = closed ? vertices.length : vertices.length - 1;
  // Each vertex placed once, as `applyX` and `applyY` place it: consecutive edges share it.
  const { a: ma, b: mb, c: mc, d: md, e: me, f: mf } = mirror;
  let v = vertices[0];
  let ax = v ? ma * v.x + mc * v.y + me : NaN;
  let ay = v ? mb * v.x + md * v.y + mf : NaN;
  for (let i = 0; i < count; i += 1) {
    const w = vertices[(i + 1) % vertices.length];
    const bx = w ? ma * w.x + mc * w.y + me : NaN;
    const by = w ? mb * w.x + md * w.y + mf : NaN;
    if (v && w && !(ax === bx && ay === by)) store.push(ax, ay, bx, by, flip * (v.bulge ?? 0));
    v = w;
    ax = bx;
    ay = by;
  }
  return { start, end: store.count };
}

function lwpolylineEdges(entity: ILwpolylineEntity, notes: EntityNote[], store: EdgeStore): [EdgeRange, boolean] {
  const vertices = entity.vertices ?? [];
  const closed = Boolean(entity.shape);
  return [verticesToEdges(vertices, closed, ocsMirror(entity, notes), store), closed];
}

function polylineEdges(entity: IPolylineEntity, notes: EntityNote[], store: EdgeStore): [EdgeRange, boolean] {
  if (entity.isPolyfaceMesh || entity.is3dPolygonMesh) {
    notes.push({
      code: 'mesh-skipped',
      message: 'polygon and polyface meshes are 3D surfaces, not outlines, and were left out',
    });
    return [{ start: store.count, end: store.count }, false];
  }
  const vertices = (entity.vertices ?? []).filter((v) => !v.splineControlPoint);
  const zs = vertices.map((v) => v.z ?? 0);
  if (zs.length > 0 && Math.max(...zs) - Math.min(...zs) > 1e-9) {
    notes.push({ code: 'z-flattened', message: 'polylines with varying Z were flattened onto the XY plane' });
  }
  const closed = Boolean(entity.shape);
  return [verticesToEdges(vertices, closed, entity.is3dPolyline ? IDENTITY : ocsMirror(entity, notes), store), closed];
}

function ellipseEdges(entity: IEllipseEntity, chordTolerance: number, store: EdgeStore): [EdgeRange, boolean] {
  const ellipse = {
    centre: xy(entity.center ?? { x: 0, y: 0, z: 0 }),
    majorAxis: xy(entity.majorAxisEndPoint ?? { x: 0, y: 0, z: 0 }),
    ratio: entity.axisRatio ?? 1,
    startParameter: entity.startAngle ?? 0,
    endParameter: entity.endAngle ?? TURN,
  };
  if (Math.hypot(ellipse.majorAxis.x, ellipse.majorAxis.y) === 0)
    return [{ start: store.count, end: store.count }, false];
  const full = isFullEllipse(ellipse);
  const points = sampleEllipse(ellipse, chordTolerance);
  if (full) points[points.length - 1] = points[0] as Vec;
  return [pushChordsThrough(points, store), full];
}

function splineEdges(entity: WeightedSplineEntity, notes: EntityNote[], store: EdgeStore): [EdgeRange, boolean] {
  const curve = {
    degree: entity.degree,
    controlPoints: entity.controlPoints.map(xy),
    knots: entity.knots,
    weights: entity.rational ? entity.weights : [],
  };
  let points: Vec[];
  if (isValidNurbs(curve)) {
    points = sampleNurbs(curve, Math.min(4096, Math.max(32, curve.controlPoints.length * 16)));
  } else {
    const fallback = entity.fitPoints.length >= 2 ? entity.fitPoints : entity.controlPoints;
    if (fallback.length < 2) return [{ start: store.count, end: store.count }, false];
    notes.push({
      code: 'spline-approximated',
      message: 'splines without a usable knot vector were drawn through their fit or control points',
    });
    points = fallback.map(xy);
  }
  const first = points[0] as Vec;
  const last = points[points.length - 1] as Vec;
  const closed =
    entity.closed && Math.hypot(first.x - last.x, first.y - last.y) > 0 ? (points.push(first), true) : entity.closed;
  return [pushChordsThrough(points, store), closed];
}

function labelOf(entity: IEntity): { text: string; at: Vec } | undefined {
  if (entity.type === 'TEXT') {
    const text = entity as ITextEntity;
    const aligned = (text.halign ?? 0) !== 0 || (text.valign ?? 0) !== 0;
    const at = aligned && text.endPoint ? text.endPoint : text.startPoint;
    const clean = (text.text ?? '').trim();
    return at && clean ? { text: clean, at: xy(at) } : undefined;
  }
  const mtext = entity as IMtextEntity;
  const clean = plainMtext(mtext.text ?? '');
  return mtext.position && clean ? { text: clean, at: xy(mtext.position) } : undefined;
}

/** MTEXT without its inline formatting: paragraph breaks, font and colour codes, grouping braces. */
export function plainMtext(text: string): string {
  return text
    .replace(/\\P/g, ' ')
    .replace(/\\[ACcFfHQTW][^;\\{}]*;/g, '')
    .replace(/\\[LlOoKk]/g, '')
    .replace(/\\S([^;]*)\^([^;]*);/g, '$1/$2')
    .replace(/\\~/g, ' ')
    .replace(/[{}]/g, '')
    .replace(/\s+/g, ' ')
    .trim();
}
