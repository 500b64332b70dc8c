import type { Licence, PlanCategory, Tool } from './api/types';

/** The plans' fixed word lists as the screens show them (the same as `plans-seed/vocabulary.json`). */
export const CATEGORY_NAMES: Record<PlanCategory, string> = {
  sled: 'sled',
  fence: 'fence',
  'taper-jig': 'taper jig',
  'circle-jig': 'circle jig',
  'drilling-guide': 'drilling guide',
  'router-jig': 'router jig',
  'indexing-jig': 'indexing jig',
  clamping: 'clamping',
  sharpening: 'sharpening',
  other: 'other',
};

export const TOOLS: Record<Tool, { name: string; power: boolean }> = {
  'table-saw': { name: 'table saw', power: true },
  'router-table': { name: 'router table', power: true },
  'band-saw': { name: 'band saw', power: true },
  'drill-press': { name: 'drill press', power: true },
  'hand-drill': { name: 'hand drill', power: true },
  router: { name: 'router', power: true },
  jigsaw: { name: 'jigsaw', power: true },
  'random-orbit-sander': { name: 'random-orbit sander', power: true },
  '3d-printer': { name: '3D printer', power: true },
  'soldering-iron': { name: 'soldering iron', power: true },
  'hand-plane': { name: 'hand plane', power: false },
  'hand-saw': { name: 'hand saw', power: false },
};

export const LICENCES: Record<Licence, { name: string; url: string }> = {
  'CC-BY-4.0': { name: 'CC BY 4.0', url: 'https://spdx.org/licenses/CC-BY-4.0.html' },
  'CC-BY-SA-4.0': { name: 'CC BY-SA 4.0', url: 'https://spdx.org/licenses/CC-BY-SA-4.0.html' },
  'CC0-1.0': { name: 'CC0 1.0 (public domain)', url: 'https://spdx.org/licenses/CC0-1.0.html' },
  'CERN-OHL-P-2.0': { name: 'CERN OHL-P 2.0', url: 'https://spdx.org/licenses/CERN-OHL-P-2.0.html' },
  'CERN-OHL-W-2.0': { name: 'CERN OHL-W 2.0', url: 'https://spdx.org/licenses/CERN-OHL-W-2.0.html' },
  'CERN-OHL-S-2.0': { name: 'CERN OHL-S 2.0', url: 'https://spdx.org/licenses/CERN-OHL-S-2.0.html' },
};

export const isCategory = (text: string | null): text is PlanCategory => text !== null && text in CATEGORY_NAMES;
export const isTool = (text: string): text is Tool => text in TOOLS;
export const isLicence = (text: string | null): text is Licence => text !== null && text in LICENCES;
