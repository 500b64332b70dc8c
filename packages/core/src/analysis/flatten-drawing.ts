import type { IDimensionEntity, IInsertEntity } from 'dxf-parser';
import { DrawingLimitError } from '../dxf/drawing-error';
import type { DrawingLimits } from '../dxf/limits';
import { apply, compose, rotation, scaling, translation, uniformScale, type Affine } from '../geometry/affine';
import { appendTransformedEdge } from '../geometry/edge';
import type { EdgeRange, EdgeStore } from '../geometry/edge-store';
import type { Vec } from '../geometry/vec';
import { insertCopies } from './block-expansion';
import type { FlatBlock, FlatItem } from './entity-items';
import type { AnalysisWarning, SourceRef, WarningCode } from './types';

/** A run of edges from one entity, in mm; `closed` when the entity itself is closed. */
export interface FlatPiece {
  /** Its edges in the analysis' edge store. */
  range: EdgeRange;
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
  /** The store holding the items' edges; the transformed copies are appended to it. */
  edges: EdgeStore;
  mmPerUnit: number;
  limits: Pick<DrawingLimits, 'maxTimeMs'>;
  /** Milliseconds clock; the caller's so that a test can stand still or jump. */
  now: () => number;
}

interface Context {
  transform: Affine;
  layer: string | undefined;
  block: string | undefined;
}

const TIME_CHECK_EVERY = 1024;
// Entities that are drawn but are neither outlines nor labels: counted, never reported as unknown.
const NON_OUTLINE_TYPES = new Set(['POINT', 'SOLID', '3DFACE', 'ATTDEF', 'SEQEND', 'ATTRIB', 'VIEWPORT', 'HATCH']);

/** Expands every insert and array cell of model space into pieces, labels and dimensions, in mm. */
export function flattenDrawing(
  items: readonly FlatItem[],
  blocks: ReadonlyMap<string, FlatBlock>,
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

  const visit = (list: readonly FlatItem[], context: Context): void => {
    for (const item of list) {
      out.expanded += 1;
      if (out.expanded % TIME_CHECK_EVERY === 0 && options.now() > deadline) {
        throw new DrawingLimitError('maxTimeMs', options.limits.maxTimeMs, 'the analysis took longer than that');
      }
      const source = sourceOf(item, context);
      if (item.kind === 'unknown') {
        if (!NON_OUTLINE_TYPES.has(item.type)) out.unknown[item.type] = (out.unknown[item.type] ?? 0) + 1;
        continue;
      }
      out.byType[item.type] = (out.byType[item.type] ?? 0) + 1;
      if (item.notes) for (const { code, message } of item.notes) note(code, message, source);
      switch (item.kind) {
        case 'insert':
          visitInsert(item.insert, context, source);
          break;
        case 'piece':
          out.pieces.push({
            range: transformEdges(options.edges, item.range, context.transform, note, source),
            closed: item.closed,
            source,
          });
          break;
        case 'text':
          out.texts.push({
            text: item.text,
            at: isIdentity(context.transform) ? item.at : apply(context.transform, item.at),
            source,
          });
          break;
        case 'dimension':
          out.dimensions.push({ entity: item.entity, transform: context.transform, source });
          break;
        default:
          break;
      }
    }
  };

  const visitInsert = (insert: IInsertEntity, context: Context, source: SourceRef): void => {
    const block = blocks.get(insert.name);
    if (!block) {
      note('missing-block', `an INSERT names a block that is not defined: "${insert.name}"`, source);
      return;
    }
    const base = block.base;
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
      visit(block.items, { transform, layer, block: named });
    }
  };

  visit(items, { transform: scaling(options.mmPerUnit, options.mmPerUnit), layer: undefined, block: undefined });
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

function sourceOf(item: FlatItem, context: Context): SourceRef {
  const own = item.layer;
  const layer = own === '0' && context.layer !== undefined ? context.layer : own;
  return context.block === undefined
    ? { handle: item.handle, layer }
    : { handle: item.handle, layer, block: context.block };
}

type Note = (code: WarningCode, message: string, source?: SourceRef) => void;

function transformEdges(
  store: EdgeStore,
  range: EdgeRange,
  transform: Affine,
  note: Note,
  source: SourceRef,
): EdgeRange {
  // Model space of a millimetre drawing: the edges are already where they belong.
  if (isIdentity(transform)) return range;
  if (uniformScale(transform) === undefined) {
    let arcs = false;
    for (let i = range.start; i < range.end && !arcs; i += 1) arcs = store.bulge(i) !== 0;
    if (arcs) {
      note(
        'stretched-arcs',
        'arcs in inserts with unequal X and Y scales became elliptical and are drawn as fine chords',
        source,
      );
    }
  }
  const start = store.count;
  for (let i = range.start; i < range.end; i += 1) appendTransformedEdge(store, i, transform, store);
  return { start, end: store.count };
}

function isIdentity(t: Affine): boolean {
  return t.a === 1 && t.b === 0 && t.c === 0 && t.d === 1 && t.e === 0 && t.f === 0;
}
