import type { IDxf } from 'dxf-parser';
import { DEFAULT_DRAWING_LIMITS, type DrawingLimits } from '../dxf/limits';
import { readDxfInChunks, type DxfPart } from '../dxf/read-dxf';
import { containsBounds, isEmptyBounds, unionBounds, type Bounds } from '../geometry/bounds';
import { ARC_STRIDE } from '../geometry/bulge';
import { DEFAULT_CHORD_TOLERANCE, widenByEdgeBounds, writeEdgeArc } from '../geometry/edge';
import { EdgeStore } from '../geometry/edge-store';
import { pointInLoop } from '../geometry/point-in-loop';
import { mmPerDrawingUnit, unitsFromInsunits, type DrawingUnits } from '../units/insunits';
import { countExpandedEntities } from './block-expansion';
import { chainLoops } from './chain-loops';
import { entityItems, type FlatBlock, type FlatItem } from './entity-items';
import { flattenDrawing, type FlatPiece, type FlatText } from './flatten-drawing';
import { groupParts, type MeasuredPart } from './group-parts';
import { measureLoops, reverseLoop, type MeasuredLoop } from './loop-geometry';
import { buildLoopTree, type LoopTree } from './loop-tree';
import { measureDimensions } from './measure-dimensions';
import { measurePart } from './measure-part';
import { OutlineDirections } from './outline-directions';
import type { AnalysisWarning, DrawingAnalysis, SourceRef } from './types';

export interface AnalysisOptions {
  /** Units to read the drawing in; wins over the header's `$INSUNITS`. */
  units?: DrawingUnits;
  /** End points closer than this (mm) are joined; sizes closer than this are the same part. */
  tolerance?: number;
  /** Largest gap (mm) between a curve and the polygon drawn for it. */
  chordTolerance?: number;
  limits?: Partial<DrawingLimits>;
  /** Milliseconds clock for the time limit. */
  now?: () => number;
}

export const DEFAULT_TOLERANCE = 0.01;

/**
 * Reads DXF text and measures it: parts with holes, sizes, names, quantities, dimensions, extents.
 * The text is parsed a piece at a time and each piece turned into edges at once, so that the
 * parser's objects for the whole drawing never exist together.
 */
export function analyzeDrawing(text: string, options: AnalysisOptions = {}): DrawingAnalysis {
  const limits = { ...DEFAULT_DRAWING_LIMITS, ...options.limits };
  const { header, parts } = readDxfInChunks(text, limits);
  return analyzeParts(header, parts, options);
}

/** The analysis of an already parsed drawing (dxf-parser's output, read with `readDxf`). */
export function analyzeParsedDrawing(dxf: IDxf, options: AnalysisOptions = {}): DrawingAnalysis {
  return analyzeParts(dxf.header ?? {}, [dxf], options);
}

function analyzeParts(header: IDxf['header'], dxfParts: Iterable<DxfPart>, options: AnalysisOptions): DrawingAnalysis {
  const limits = { ...DEFAULT_DRAWING_LIMITS, ...options.limits };
  const tolerance = options.tolerance ?? DEFAULT_TOLERANCE;
  const chordTolerance = options.chordTolerance ?? DEFAULT_CHORD_TOLERANCE;
  const warnings: AnalysisWarning[] = [];
  const declared = unitsFromInsunits(typeof header.$INSUNITS === 'number' ? header.$INSUNITS : undefined);
  const units = options.units ?? declared;
  if (options.units && declared !== 'unknown' && declared !== options.units) {
    warnings.push({
      code: 'units-overridden',
      message: `the drawing declares ${declared}; read as ${options.units} as asked`,
    });
  }
  const known = mmPerDrawingUnit(units);
  if (known === undefined) {
    warnings.push({
      code: 'units-unknown',
      message: 'the drawing does not say its units ($INSUNITS); numbers are read as millimetres',
    });
  }
  const mmPerUnit = known ?? 1;
  const edges = new EdgeStore();
  const itemOptions = { chordTolerance: chordTolerance / mmPerUnit, edges };
  const items: FlatItem[] = [];
  const blocks = new Map<string, FlatBlock>();
  for (const part of dxfParts) {
    for (const [name, block] of Object.entries(part.blocks ?? {})) {
      const base = block.position ?? { x: 0, y: 0 };
      blocks.set(name, { base: { x: base.x, y: base.y }, items: entityItems(block.entities ?? [], itemOptions) });
    }
    for (const item of entityItems(part.entities ?? [], itemOptions)) items.push(item);
  }
  countExpandedEntities(items, blocks, limits);
  const flat = flattenDrawing(items, blocks, { edges, mmPerUnit, limits, now: options.now ?? Date.now });
  warnings.push(...flat.warnings);

  const chained = chainLoops(flat.pieces, edges, tolerance);
  if (chained.openPaths > 0) {
    warnings.push({
      code: 'open-paths',
      message: `${chained.openPaths} open path${chained.openPaths === 1 ? ' does' : 's do'} not close into an outline and ${chained.openPaths === 1 ? 'is not a part' : 'are not parts'}`,
    });
  }
  if (chained.branchPoints > 0) {
    warnings.push({
      code: 'branching-paths',
      message: `${chained.branchPoints} point${chained.branchPoints === 1 ? ' joins' : 's join'} three or more paths; the outlines there may be chained wrongly`,
    });
  }
  const measuredLoops = measureLoops(edges, chained.loops);
  const extents = drawingExtents(edges, flat.pieces, measuredLoops);
  const loops = measuredLoops.filter((loop) => Math.abs(loop.signedArea) > 0);
  const tree = buildLoopTree(edges, loops);
  const labels = labelsByLoop(edges, loops, tree, flat.texts);

  const parts: MeasuredPart[] = [];
  const overlapping: SourceRef[] = [];
  const holesOf = new Map<number, MeasuredLoop[]>();
  loops.forEach((loop, i) => {
    const p = tree.parent[i] as number;
    if (p < 0 || (tree.depth[i] as number) % 2 !== 1) return;
    const list = holesOf.get(p);
    if (list) list.push(loop);
    else holesOf.set(p, [loop]);
  });
  const directions = new OutlineDirections(edges);
  loops.forEach((loop, i) => {
    if ((tree.depth[i] as number) % 2 !== 0) return;
    const outline = loop.signedArea < 0 ? reverseLoop(edges, loop) : loop;
    const holes = holesOf.get(i) ?? [];
    const measure = measurePart(edges, outline, holes, { chordTolerance, directions });
    if (measure.area <= 0) overlapping.push(...outline.loop.sources.slice(0, 1));
    parts.push({ outline, holes, measure, label: labels.get(i) });
  });
  if (overlapping.length > 0) {
    warnings.push({
      code: 'overlapping-outlines',
      message: `${overlapping.length} outline${overlapping.length === 1 ? ' has' : 's have'} holes that overlap one another or cover the whole outline, so the area left is not positive`,
      sources: overlapping.slice(0, 50),
    });
  }

  const measured = measureDimensions(flat.dimensions, { tolerance, mmPerUnit });
  warnings.push(...measured.warnings);
  return {
    units,
    mmPerUnit,
    extents: isEmptyBounds(extents)
      ? null
      : { min: [micro(extents.minX), micro(extents.minY)], max: [micro(extents.maxX), micro(extents.maxY)] },
    parts: groupParts(edges, parts, { tolerance, chordTolerance }),
    dimensions: measured.dimensions,
    warnings,
    entities: { expanded: flat.expanded, byType: flat.byType, unknown: flat.unknown },
    openPaths: chained.openPaths,
  };
}

/**
 * Box of every edge. A closed piece whose loop kept the piece's own edges is already measured
 * (the loop's box is the union of the same edge boxes); the other pieces are boxed here.
 */
function drawingExtents(store: EdgeStore, pieces: readonly FlatPiece[], loops: readonly MeasuredLoop[]): Bounds {
  // A loop that kept its piece's edges has the piece's range; chained and snapped loops have
  // ranges of their own, appended after every piece's, so the start tells them apart.
  const measured = new Set(loops.map((loop) => loop.loop.range.start));
  let box = piecesExtents(
    store,
    pieces.filter((piece) => !measured.has(piece.range.start)),
  );
  for (const loop of loops) box = unionBounds(box, loop.bounds);
  return box;
}

/**
 * The end points go first; then only the arcs that might reach past that box get their exact
 * extremes: an arc of at most a half turn lies within its chord's box widened by its sagitta, so
 * most arcs of a drawing are settled without trigonometry.
 */
function piecesExtents(store: EdgeStore, pieces: readonly FlatPiece[]): Bounds {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const { range } of pieces) {
    for (let i = range.start; i < range.end; i += 1) {
      minX = Math.min(minX, store.ax(i), store.bx(i));
      minY = Math.min(minY, store.ay(i), store.by(i));
      maxX = Math.max(maxX, store.ax(i), store.bx(i));
      maxY = Math.max(maxY, store.ay(i), store.by(i));
    }
  }
  const arc = new Float64Array(ARC_STRIDE);
  const box = Float64Array.of(minX, minY, maxX, maxY);
  for (const { range } of pieces) {
    for (let i = range.start; i < range.end; i += 1) {
      if (store.bulge(i) === 0) continue;
      const ax = store.ax(i);
      const ay = store.ay(i);
      const bx = store.bx(i);
      const by = store.by(i);
      const bulge = Math.abs(store.bulge(i));
      const sagitta = (bulge * Math.hypot(bx - ax, by - ay)) / 2;
      if (
        bulge <= 1 &&
        Math.min(ax, bx) - sagitta >= (box[0] as number) &&
        Math.min(ay, by) - sagitta >= (box[1] as number) &&
        Math.max(ax, bx) + sagitta <= (box[2] as number) &&
        Math.max(ay, by) + sagitta <= (box[3] as number)
      )
        continue;
      writeEdgeArc(store, i, arc, 0);
      widenByEdgeBounds(store, i, arc, 0, box);
    }
  }
  return { minX: box[0] as number, minY: box[1] as number, maxX: box[2] as number, maxY: box[3] as number };
}

/** Rounded to a micrometre, which also drops the rounding noise of arc extremes. */
function micro(value: number): number {
  const rounded = Math.round(value * 1e6) / 1e6;
  return Object.is(rounded, -0) ? 0 : rounded;
}

/** The first label lying inside each part outline (innermost loop holding the label's point). */
function labelsByLoop(
  store: EdgeStore,
  loops: readonly MeasuredLoop[],
  { depth, grid }: LoopTree,
  texts: readonly FlatText[],
): Map<number, string> {
  const labels = new Map<number, string>();
  if (texts.length === 0 || loops.length === 0) return labels;
  for (const text of texts) {
    let best = -1;
    let bestArea = Infinity;
    const point = { minX: text.at.x, minY: text.at.y, maxX: text.at.x, maxY: text.at.y };
    const candidates = grid.candidates(text.at.x, text.at.y);
    for (let k = 0; k < candidates.length; k += 1) {
      const j = candidates[k] as number;
      const loop = loops[j] as MeasuredLoop;
      const area = Math.abs(loop.signedArea);
      if (
        area < bestArea &&
        containsBounds(loop.bounds, point) &&
        pointInLoop(text.at.x, text.at.y, store, loop.loop.range)
      ) {
        best = j;
        bestArea = area;
      }
    }
    if (best >= 0 && (depth[best] as number) % 2 === 0 && !labels.has(best)) labels.set(best, text.text);
  }
  return labels;
}
