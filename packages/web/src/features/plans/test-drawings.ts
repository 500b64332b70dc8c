import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import {
  analyzeDrawing,
  buildCutList,
  cutListPartsFromAnalysis,
  type CutList,
  type CutListOptions,
  type DrawingAnalysis,
} from '@jigwright/core';

const seed = resolve(import.meta.dirname, '../../../../../plans-seed/plans') + '/';

/** A demo plan's drawing analysed by the core, as the server stores it; for tests. */
export function analyseDemoDrawing(relativePath: string): DrawingAnalysis {
  return analyzeDrawing(readFileSync(`${seed}${relativePath}`, 'utf8'));
}

interface DemoPartSettings {
  name: string;
  quantity: number;
  material: string;
  thickness: number;
  stock: 'sheet' | 'solid' | 'linear';
  grain: 'length' | 'width' | 'any';
}

interface DemoPlan {
  revisions: { number: number; drawings: { file: string; parts: DemoPartSettings[] }[] }[];
}

/** The owner's part settings of a demo revision, as `plan.json` gives them. */
export function demoPartSettings(slug: string, revision: number): DemoPartSettings[] {
  const plan = JSON.parse(readFileSync(`${seed}${slug}/plan.json`, 'utf8')) as DemoPlan;
  return plan.revisions.find((r) => r.number === revision)?.drawings.flatMap((d) => d.parts) ?? [];
}

/** A demo revision's cut list, from its drawings and the owner's part settings, with the core's defaults. */
export function demoCutList(slug: string, revision: number, drawing: string, options: CutListOptions = {}): CutList {
  const settings = demoPartSettings(slug, revision);
  const byName = Object.fromEntries(settings.map(({ name, ...own }) => [name, own]));
  const { parts } = cutListPartsFromAnalysis(analyseDemoDrawing(`${slug}/r${revision}/${drawing}`), { byName });
  return buildCutList(parts, options);
}
