import type {
  IArcEntity,
  IBlock,
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
import { DrawingLimitError } from '../dxf/drawing-error';
import { isUnknownEntity, type WeightedSplineEntity } from '../dxf/entity-handlers';
import type { DrawingLimits } from '../dxf/limits';
import {
  apply,
  compose,
  determinant,
  IDENTITY,
  rotation,
  scaling,
  translation,
  uniformScale,
  type Affine,
} from '../geometry/affine';
import { bulgeFromSweep } from '../geometry/bulge';
import { chordsThrough, transformEdge, type Edge } from '../geometry/edge';
import { isFullEllipse, sampleEllipse } from '../geometry/ellipse';
import { isValidNurbs, sampleNurbs } from '../geometry/nurbs';
import type { Vec } from '../geometry/vec';
import { insertCopies } from './block-expansion';
import type { AnalysisWarning, SourceRef, WarningCode } from './types';

/** A run of edges from one entity, in mm; `closed` when the entity itself is closed. */
export interface FlatPiece {
  edges: Edge[];
  closed: boolean;
  source: SourceRef;
}

export interface FlatText {
  text: string;
  at: Vec;
  source: SourceRef;
}

export interface FlatDimension {
  entity: IDimensionEntity;
  /** Drawing units to mm, through every insert above the dimension. */
  transform: Affine;
  source: SourceRef;
}

export interface FlatDrawing {
  pieces: FlatPiece[];
  texts: FlatText[];
  dimensions: FlatDimension[];
  byType: Record<string, number>;
  unknown: Record<string, number>;
  expanded: number;
  warnings: AnalysisWarning[];
}

export interface FlattenOptions {
  mmPerUnit: number;
  chordTolerance: number;
  limits: Pick<DrawingLimits, 'maxTimeMs'>;
  /** Milliseconds clock; the caller's so that a test can stand still or jump. */
  now: () => number;
}

interface Context {
  transform: Affine;
  layer: string | undefined;
  block: string | undefined;
}

const TURN = 2 * Math.PI;
const TIME_CHECK_EVERY = 1024;
// Entities that are drawn but are neither outlines nor labels: counted, never reported as unknown.
const NON_OUTLINE_TYPES = new Set(['POINT', 'SOLID', '3DFACE', 'ATTDEF', 'SEQEND', 'ATTRIB', 'VIEWPORT', 'HATCH']);

/** Expands every insert and array cell of model space into pieces, labels and dimensions, in mm. */
export function flattenDrawing(
  entities: readonly IEntity[],
  blocks: Readonly<Record<string, IBlock>>,
  options: FlattenOptions,
): FlatDrawing {
  const out: FlatDrawing = {
    pieces: [],
    texts: [],
    dimensions: [],
    byType: {},
    unknown: {},
    expanded: 0,
    warnings: [],
  };
  const notes = new Map<WarningCode, { message: string; sources: SourceRef[] }>();
  const note = (code: WarningCode, message: string, source?: SourceRef): void => {
    const entry = notes.get(code) ?? { message, sources: [] };
    if (source && entry.sources.length < 50) entry.sources.push(source);
    notes.set(code, entry);
  };
  const deadline = options.now() + options.limits.maxTimeMs;

  const visit = (list: readonly IEntity[], context: Context): void => {
    for (const entity of list) {
      if (entity.inPaperSpace) continue;
      out.expanded += 1;
      if (out.expanded % TIME_CHECK_EVERY === 0 && options.now() > deadline) {
        throw new DrawingLimitError('maxTimeMs', options.limits.maxTimeMs, 'the analysis took longer than that');
      }
      const source = sourceOf(entity, context);
      if (isUnknownEntity(entity)) {
        if (!NON_OUTLINE_TYPES.has(entity.type)) out.unknown[entity.type] = (out.unknown[entity.type] ?? 0) + 1;
        continue;
      }
      out.byType[entity.type] = (out.byType[entity.type] ?? 0) + 1;
      if (entity.type === 'INSERT') {
        visitInsert(entity as IInsertEntity, context, source);
        continue;
      }
      const piece = (edges: Edge[], closed: boolean): void => {
        if (edges.length > 0)
          out.pieces.push({ edges: transformEdges(edges, context.transform, note, source), closed, source });
      };
      switch (entity.type) {
        case 'LINE': {
          const [a, b] = (entity as ILineEntity).vertices ?? [];
          if (a && b) piece([{ a: xy(a), b: xy(b), bulge: 0 }], false);
          break;
        }
        case 'ARC':
        case 'CIRCLE':
          piece(...circularEdges(entity as IArcEntity, note, source));
          break;
        case 'LWPOLYLINE':
          piece(...lwpolylineEdges(entity as ILwpolylineEntity, note, source));
          break;
        case 'POLYLINE':
          piece(...polylineEdges(entity as IPolylineEntity, note, source));
          break;
        case 'ELLIPSE':
          piece(...ellipseEdges(entity as IEllipseEntity, options.chordTolerance / options.mmPerUnit));
          break;
        case 'SPLINE':
          piece(...splineEdges(entity as unknown as WeightedSplineEntity, note, source));
          break;
        case 'TEXT':
        case 'MTEXT': {
          const label = labelOf(entity);
          if (label) out.texts.push({ text: label.text, at: apply(context.transform, label.at), source });
          break;
        }
        case 'DIMENSION':
          out.dimensions.push({ entity: entity as IDimensionEntity, transform: context.transform, source });
          break;
        default:
          break;
      }
    }
  };

  const visitInsert = (insert: IInsertEntity, context: Context, source: SourceRef): void => {
    const block = blocks[insert.name];
    if (!block) {
      note('missing-block', `an INSERT names a block that is not defined: "${insert.name}"`, source);
      return;
    }
    const base = block.position ?? { x: 0, y: 0, z: 0 };
    const columns = Math.max(1, Math.floor(insert.columnCount || 1));
    const rows = Math.max(1, Math.floor(insert.rowCount || 1));
    const placement = insertPlacement(insert);
    const layer = insert.layer === '0' || insert.layer === undefined ? context.layer : insert.layer;
    const named = insert.name.startsWith('*') ? context.block : insert.name;
    for (let copy = 0; copy < insertCopies(insert); copy += 1) {
      const column = copy % columns;
      const row = Math.floor(copy / columns) % rows;
      // p' = R·(S·(p − base) + (column·44, row·45)) + insertion point, then the OCS mirror if any.
      const local = compose(
        translation(column * (insert.columnSpacing || 0), row * (insert.rowSpacing || 0)),
        compose(scaling(placement.sx, placement.sy), translation(-base.x, -base.y)),
      );
      const transform = compose(context.transform, compose(placement.outer, local));
      visit(block.entities ?? [], { transform, layer, block: named });
    }
  };

  visit(entities, { transform: scaling(options.mmPerUnit, options.mmPerUnit), layer: undefined, block: undefined });
  for (const [code, entry] of notes) {
    out.warnings.push({
      code,
      message: entry.message,
      ...(entry.sources.length > 0 ? { sources: entry.sources } : {}),
    });
  }
  if (Object.keys(out.unknown).length > 0) {
    const list = Object.entries(out.unknown)
      .map(([type, count]) => `${type} × ${count}`)
      .join(', ');
    out.warnings.push({ code: 'unknown-entities', message: `entity types left out of the analysis: ${list}` });
  }
  return out;
}

function insertPlacement(insert: IInsertEntity): { outer: Affine; sx: number; sy: number } {
  const position = insert.position ?? { x: 0, y: 0, z: 0 };
  const outer = compose(translation(position.x, position.y), rotation(((insert.rotation ?? 0) * Math.PI) / 180));
  const sx = insert.xScale ?? 1;
  const sy = insert.yScale ?? 1;
  const mirrored = (insert.extrusionDirection?.z ?? 1) < 0;
  return { outer: mirrored ? compose(scaling(-1, 1), outer) : outer, sx, sy };
}

function sourceOf(entity: IEntity, context: Context): SourceRef {
  const own = entity.layer ?? '0';
  const layer = own === '0' && context.layer !== undefined ? context.layer : own;
  return {
    handle: String(entity.handle ?? ''),
    layer,
    ...(context.block !== undefined ? { block: context.block } : {}),
  };
}

type Note = (code: WarningCode, message: string, source?: SourceRef) => void;

function transformEdges(edges: Edge[], transform: Affine, note: Note, source: SourceRef): Edge[] {
  const similar = uniformScale(transform) !== undefined;
  if (!similar && edges.some((edge) => edge.bulge !== 0)) {
    note(
      'stretched-arcs',
      'arcs in inserts with unequal X and Y scales became elliptical and are drawn as fine chords',
      source,
    );
  }
  if (!similar) return edges.flatMap((edge) => transformEdge(edge, transform));
  const flip = determinant(transform) < 0;
  return edges.map((edge) => ({
    a: apply(transform, edge.a),
    b: apply(transform, edge.b),
    bulge: flip ? -edge.bulge : edge.bulge,
  }));
}

function xy(p: IPoint): Vec {
  return { x: p.x, y: p.y };
}

/** OCS with extrusion (0, 0, −1), the usual way CAD programs mirror 2D entities, flips X. */
function ocsMirror(entity: IEntity, note: Note, source: SourceRef): Affine {
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
    note('unsupported-extrusion', 'entities drawn in a tilted plane were projected as if flat', source);
  }
  return z < 0 ? scaling(-1, 1) : IDENTITY;
}

function circularEdges(entity: IArcEntity | ICircleEntity, note: Note, source: SourceRef): [Edge[], boolean] {
  const centre = entity.center ?? { x: 0, y: 0, z: 0 };
  const r = entity.radius ?? 0;
  if (!(r > 0)) return [[], false];
  const mirror = ocsMirror(entity, note, source);
  const at = (angle: number): Vec =>
    apply(mirror, { x: centre.x + r * Math.cos(angle), y: centre.y + r * Math.sin(angle) });
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
        { a: at(start), b: at(start + Math.PI), bulge: flip },
        { a: at(start + Math.PI), b: at(start), bulge: flip },
      ],
      true,
    ];
  }
  return [[{ a: at(start), b: at(start + sweep), bulge: flip * bulgeFromSweep(sweep) }], false];
}

function verticesToEdges(
  vertices: readonly { x: number; y: number; bulge?: number }[],
  closed: boolean,
  mirror: Affine,
): Edge[] {
  const flip = mirror === IDENTITY ? 1 : -1;
  const edges: Edge[] = [];
  const count = closed ? vertices.length : vertices.length - 1;
  for (let i = 0; i < count; i += 1) {
    const v = vertices[i];
    const w = vertices[(i + 1) % vertices.length];
    if (!v || !w) continue;
    const a = apply(mirror, v);
    const b = apply(mirror, w);
    if (a.x === b.x && a.y === b.y) continue;
    edges.push({ a, b, bulge: flip * (v.bulge ?? 0) });
  }
  return edges;
}

function lwpolylineEdges(entity: ILwpolylineEntity, note: Note, source: SourceRef): [Edge[], boolean] {
  const vertices = entity.vertices ?? [];
  const closed = Boolean(entity.shape);
  return [verticesToEdges(vertices, closed, ocsMirror(entity, note, source)), closed];
}

function polylineEdges(entity: IPolylineEntity, note: Note, source: SourceRef): [Edge[], boolean] {
  if (entity.isPolyfaceMesh || entity.is3dPolygonMesh) {
    note('mesh-skipped', 'polygon and polyface meshes are 3D surfaces, not outlines, and were left out', source);
    return [[], false];
  }
  const vertices = (entity.vertices ?? []).filter((v) => !v.splineControlPoint);
  const zs = vertices.map((v) => v.z ?? 0);
  if (zs.length > 0 && Math.max(...zs) - Math.min(...zs) > 1e-9) {
    note('z-flattened', 'polylines with varying Z were flattened onto the XY plane', source);
  }
  const closed = Boolean(entity.shape);
  return [verticesToEdges(vertices, closed, entity.is3dPolyline ? IDENTITY : ocsMirror(entity, note, source)), closed];
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

function splineEdges(entity: WeightedSplineEntity, note: Note, source: SourceRef): [Edge[], boolean] {
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
    note(
      'spline-approximated',
      'splines without a usable knot vector were drawn through their fit or control points',
      source,
    );
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
