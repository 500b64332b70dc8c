/**
 * The fixed word lists of plans, the same as `plans-seed/vocabulary.json` (a unit spec keeps them
 * equal). Categories are stored and sent as kebab-case ids; the words with spaces are what the
 * screens show.
 */
export const PLAN_CATEGORIES = [
  'sled',
  'fence',
  'taper-jig',
  'circle-jig',
  'drilling-guide',
  'router-jig',
  'indexing-jig',
  'clamping',
  'sharpening',
  'other',
] as const;
export type PlanCategory = (typeof PLAN_CATEGORIES)[number];

/** "taper jig" (the word in vocabulary.json and on screen) → "taper-jig". */
export function categoryId(word: string): PlanCategory | undefined {
  const id = word.trim().toLowerCase().replace(/\s+/g, '-');
  return PLAN_CATEGORIES.find((category) => category === id);
}

export const TOOLS = [
  'table-saw',
  'router-table',
  'band-saw',
  'drill-press',
  'hand-drill',
  'router',
  'jigsaw',
  'random-orbit-sander',
  '3d-printer',
  'soldering-iron',
  'hand-plane',
  'hand-saw',
] as const;
export type Tool = (typeof TOOLS)[number];

/** Open licences, by SPDX id. */
export const LICENCES = [
  'CC-BY-4.0',
  'CC-BY-SA-4.0',
  'CC0-1.0',
  'CERN-OHL-P-2.0',
  'CERN-OHL-W-2.0',
  'CERN-OHL-S-2.0',
] as const;
export type Licence = (typeof LICENCES)[number];

export const STOCK_KINDS = ['sheet', 'solid', 'linear'] as const;
export type StockKind = (typeof STOCK_KINDS)[number];

export const GRAIN_RULES = ['length', 'width', 'any'] as const;
export type GrainRule = (typeof GRAIN_RULES)[number];

export const REVISION_STATES = ['draft', 'submitted', 'published', 'sent-back', 'declined', 'hidden'] as const;
export type RevisionState = (typeof REVISION_STATES)[number];

/** States in which the owner may change a revision; a submitted one is read-only until withdrawn. */
export const EDITABLE_STATES: readonly RevisionState[] = ['draft', 'sent-back'];

export const ANALYSIS_STATUSES = ['queued', 'analysing', 'done', 'failed'] as const;
export type AnalysisStatus = (typeof ANALYSIS_STATUSES)[number];
