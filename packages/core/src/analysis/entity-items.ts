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
import { apply, IDENTITY, scaling, type Affine } from '../geometry/affine';
import { bulgeFromSweep } from '../geometry/bulge';
import { chordsThrough, type Edge } from '../geometry/edge';
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
 * objects: edges, a label, or a reference, in the entity's own drawing units.
 */
export type FlatItem =
  | (ItemBase & { kind: 'piece'; edges: Edge[]; closed: boolean })
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
  let geometry: [Edge[], boolean] | undefined;
  switch (entity.type) {
    case 'INSERT':
      return { kind: 'insert', type, handle, layer, notes: undefined, insert: entity as IInsertEntity };
    case 'LINE': {
      const [a, b] = (entity as ILineEntity).vertices ?? [];
      if (a && b) geometry = [[{ a: xy(a), b: xy(b), bulge: 0 }], false];
      break;
    }
    case 'ARC':
    case 'CIRCLE':
      geometry = circularEdges(entity as IArcEntity, found);
      break;
    case 'LWPOLYLINE':
      geometry = lwpolylineEdges(entity as ILwpolylineEntity, found);
      break;
    case 'POLYLINE':
      geometry = polylineEdges(entity as IPolylineEntity, found);
      break;
    case 'ELLIPSE':
      geometry = ellipseEdges(entity as IEllipseEntity, options.chordTolerance);
      break;
    case 'SPLINE':
      geometry = splineEdges(entity as unknown as WeightedSplineEntity, found);
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
  if (geometry && geometry[0].length > 0)
    return { kind: 'piece', type, handle, layer, notes, edges: geometry[0], closed: geometry[1] };
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

function circularEdges(entity: IArcEntity | ICircleEntity, notes: EntityNote[]): [Edge[], boolean] {
  const centre = entity.center ?? { x: 0, y: 0, z: 0 };
  const r = entity.radius ?? 0;
  if (!(r > 0)) return [[], false];
  const mirror = ocsMirror(entity, notes);
  const flip = mirror === IDENTITY ? 1 : -1;
  if (entity.type === 'CIRCLE') {
    // The two quadrant points exactly, not through cos(π) and sin(π).
    const east = apply(mirror, { x: centre.x + r, y: centre.y });
    const west = apply(mirror, { x: centre.x - r, y: centre.y });
    return [
      [
        { a: east, b: west, bulge: flip },
        { a: west, b: east, bulge: flip },
      ],
      true,
    ];
  }
  const start = entity.startAngle ?? 0;
  let sweep = ((((entity.endAngle ?? TURN) - start) % TURN) + TURN) % TURN;
  if (sweep < 1e-12) sweep = TURN;
  if (sweep >= TURN - 1e-9) {
    return [
      [
        { a: onCircle(mirror, centre, r, start), b: onCircle(mirror, centre, r, start + Math.PI), bulge: flip },
        { a: onCircle(mirror, centre, r, start + Math.PI), b: onCircle(mirror, centre, r, start), bulge: flip },
      ],
      true,
    ];
  }
  return [
    [
      {
        a: onCircle(mirror, centre, r, start),
        b: onCircle(mirror, centre, r, start + sweep),
        bulge: flip * bulgeFromSweep(sweep),
      },
    ],
    false,
  ];
}

function onCircle(mirror: Affine, centre: IPoint, r: number, angle: number): Vec {
  return apply(mirror, { x: centre.x + r * Math.cos(angle), y: centre.y + r * Math.sin(angle) });
}

function verticesToEdges(
  vertices: readonly { x: number; y: number; bulge?: number }[],
  closed: boolean,
  mirror: Affine,
): Edge[] {
  const flip = mirror === IDENTITY ? 1 : -1;
  const edges: Edge[] = [];
  // Each vertex once: consecutive edges share their end points.
  const points = vertices.map((v) => apply(mirror, v));
  const count = closed ? vertices.length : vertices.length - 1;
  for (let i = 0; i < count; i += 1) {
    const v = vertices[i];
    const a = points[i];
    const b = points[(i + 1) % vertices.length];
    if (!v || !a || !b) continue;
    if (a.x === b.x && a.y === b.y) continue;
    edges.push({ a, b, bulge: flip * (v.bulge ?? 0) });
  }
  return edges;
}

function lwpolylineEdges(entity: ILwpolylineEntity, notes: EntityNote[]): [Edge[], boolean] {
  const vertices = entity.vertices ?? [];
  const closed = Boolean(entity.shape);
  return [verticesToEdges(vertices, closed, ocsMirror(entity, notes)), closed];
}

function polylineEdges(entity: IPolylineEntity, notes: EntityNote[]): [Edge[], boolean] {
  if (entity.isPolyfaceMesh || entity.is3dPolygonMesh) {
    notes.push({
      code: 'mesh-skipped',
      message: 'polygon and polyface meshes are 3D surfaces, not outlines, and were left out',
    });
    return [[], false];
  }
  const vertices = (entity.vertices ?? []).filter((v) => !v.splineControlPoint);
  const zs = vertices.map((v) => v.z ?? 0);
  if (zs.length > 0 && Math.max(...zs) - Math.min(...zs) > 1e-9) {
    notes.push({ code: 'z-flattened', message: 'polylines with varying Z were flattened onto the XY plane' });
  }
  const closed = Boolean(entity.shape);
  return [verticesToEdges(vertices, closed, entity.is3dPolyline ? IDENTITY : ocsMirror(entity, notes)), closed];
}

function ellipseEdges(entity: IEllipseEntity, chordTolerance: number): [Edge[], boolean] {
  const ellipse = {
    centre: xy(entity.center ?? { x: 0, y: 0, z: 0 }),
    majorAxis: xy(entity.majorAxisEndPoint ?? { x: 0, y: 0, z: 0 }),
    ratio: entity.axisRatio ?? 1,
    startParameter: entity.startAngle ?? 0,
    endParameter: entity.endAngle ?? TURN,
  };
  if (Math.hypot(ellipse.majorAxis.x, ellipse.majorAxis.y) === 0) return [[], false];
  const full = isFullEllipse(ellipse);
  const points = sampleEllipse(ellipse, chordTolerance);
  if (full) points[points.length - 1] = points[0] as Vec;
  return [chordsThrough(points), full];
}

function splineEdges(entity: WeightedSplineEntity, notes: EntityNote[]): [Edge[], boolean] {
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
    if (fallback.length < 2) return [[], false];
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
  return [chordsThrough(points), closed];
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
