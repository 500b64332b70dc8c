import type { EdgeStore } from '../geometry/edge-store';
import type { Vec } from '../geometry/vec';
import { loopPolygon, reverseLoop, type MeasuredLoop } from './loop-geometry';
import type { PartMeasure } from './measure-part';
import type { AnalysedPart, Outline, PointMm } from './types';

/** One part outline found on the drawing, with its holes and measures, before grouping. */
export interface MeasuredPart {
  outline: MeasuredLoop;
  /** Either way round as chained: only the first copy's are drawn, turned clockwise then. */
  holes: MeasuredLoop[];
  measure: PartMeasure;
  label: string | undefined;
}

/**
 * Groups copies of the same part: same name, same hole count, length, width and area within the
 * tolerance (area within tolerance × perimeter, the area a band of that width round it would add).
 */
export function groupParts(
  store: EdgeStore,
  parts: readonly MeasuredPart[],
  options: { tolerance: number; chordTolerance: number },
): AnalysedPart[] {
  const rows: AnalysedPart[] = [];
  const byName = new Map<string, AnalysedPart[]>();
  for (const part of parts) {
    const { name, nameSource } = partName(part);
    const m = part.measure;
    const candidates = byName.get(name) ?? [];
    const same = candidates.find(
      (row) =>
        row.holes === part.holes.length &&
        Math.abs(row.length - m.length) <= options.tolerance &&
        Math.abs(row.width - m.width) <= options.tolerance &&
        Math.abs(row.area - m.area) <= options.tolerance * Math.max(row.perimeter, m.perimeter),
    );
    const instance = {
      centre: point(m.centre),
      angle: round((m.angle * 180) / Math.PI, 1e6),
      sources: part.outline.loop.sources,
    };
    if (same) {
      same.quantity += 1;
      same.instances.push(instance);
      continue;
    }
    const row: AnalysedPart = {
      name,
      nameSource,
      layer: part.outline.loop.sources[0]?.layer ?? '0',
      quantity: 1,
      length: round(m.length, 1e6),
      width: round(m.width, 1e6),
      area: round(m.area, 1e6),
      perimeter: round(m.perimeter, 1e6),
      holes: part.holes.length,
      outline: outlineOf(store, part.outline, options.chordTolerance),
      holeOutlines: part.holes.map((hole) =>
        outlineOf(store, hole.signedArea > 0 ? reverseLoop(store, hole) : hole, options.chordTolerance),
      ),
      instances: [instance],
    };
    rows.push(row);
    candidates.push(row);
    byName.set(name, candidates);
  }
  return rows;
}

function partName(part: MeasuredPart): { name: string; nameSource: AnalysedPart['nameSource'] } {
  if (part.label) return { name: part.label, nameSource: 'label' };
  const block = part.outline.loop.sources.find((source) => source.block !== undefined)?.block;
  if (block) return { name: block, nameSource: 'block' };
  return { name: part.outline.loop.sources[0]?.layer ?? '0', nameSource: 'layer' };
}

function outlineOf(store: EdgeStore, loop: MeasuredLoop, chordTolerance: number): Outline {
  const path: Outline['path'] = [];
  for (let i = loop.loop.range.start; i < loop.loop.range.end; i += 1) {
    path.push({ x: round(store.ax(i), 1e4), y: round(store.ay(i), 1e4), bulge: round(store.bulge(i), 1e9) });
  }
  return { path, points: pairs(loopPolygon(store, loop, chordTolerance)) };
}

function pairs(flat: readonly number[]): PointMm[] {
  const points: PointMm[] = [];
  for (let i = 0; i < flat.length; i += 2)
    points.push([round(flat[i] as number, 1e4), round(flat[i + 1] as number, 1e4)]);
  return points;
}

function point(p: Vec): PointMm {
  return [round(p.x, 1e4), round(p.y, 1e4)];
}

function round(value: number, per: number): number {
  const rounded = Math.round(value * per) / per;
  return Object.is(rounded, -0) ? 0 : rounded;
}
