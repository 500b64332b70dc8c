import {
  buildCutList,
  DEFAULT_ALLOWANCES,
  DEFAULT_BAR_LENGTHS,
  DEFAULT_KERF,
  DEFAULT_SHEET,
  type CutListPart,
} from '@jigwright/core';
import { LICENCES, type AnalysisStatus, type Tool } from '../plans/vocabulary';

/** The review desk's checks of a submission (DESIGN.md §3.9), in the order the desk shows them. */
export const REVIEW_CHECKS = ['drawing', 'cut-list', 'safety-notes', 'licence'] as const;
export type ReviewCheck = (typeof REVIEW_CHECKS)[number];

export interface CheckResult {
  check: ReviewCheck;
  label: string;
  ok: boolean;
  /** What was found, in one line, whether it passed or not. */
  summary: string;
  /** Each problem found; empty when the check passed. */
  problems: string[];
}

/**
 * Tools that need no mains or battery power (`power: false` in plans-seed/vocabulary.json; a spec
 * keeps them equal). Every other tool counts as a power tool, so a tool added to the list later asks
 * for safety notes until someone says otherwise.
 */
export const HAND_TOOLS: readonly Tool[] = ['hand-plane', 'hand-saw'];

/**
 * The longest solid board counted as buyable: 16 ft, the longest length dimensional lumber is
 * commonly stocked in [common practice]; the thickest: 16/4 hardwood, 4 in [common practice]; in mm
 * with 1 in = 25.4 mm exactly. Solid parts wider than a board are usually glued up, so width is not
 * checked.
 */
export const LONGEST_BOARD_MM = 16 * 12 * 25.4;
export const THICKEST_BOARD_MM = 4 * 25.4;

export interface ChecklistDrawing {
  originalName: string;
  status: AnalysisStatus;
  error: string | null;
  /** The drawing declares its units, or the designer chose them. */
  unitsKnown: boolean;
}

/** A part as the cut list takes it: `quantity` is the designer's override, else the drawing's count. */
export type ChecklistPart = CutListPart;

export interface ChecklistInput {
  plan: { motorised: boolean; tools: readonly Tool[]; licence: string };
  safetyNotes: string;
  drawings: readonly ChecklistDrawing[];
  parts: readonly ChecklistPart[];
}

const mm = (value: number) => `${Math.round(value * 10) / 10} mm`;
const plural = (count: number, word: string) => `${count} ${word}${count === 1 ? '' : 's'}`;

function result(check: ReviewCheck, label: string, problems: string[], summary: string): CheckResult {
  return { check, label, ok: problems.length === 0, summary, problems };
}

function drawingCheck({ drawings, parts }: ChecklistInput): CheckResult {
  const problems: string[] = [];
  if (drawings.length === 0) problems.push('No drawing is uploaded.');
  for (const drawing of drawings) {
    if (drawing.status === 'queued' || drawing.status === 'analysing')
      problems.push(`${drawing.originalName} is still being analysed.`);
    else if (drawing.status === 'failed')
      problems.push(`The analysis of ${drawing.originalName} failed: ${drawing.error ?? 'no reason given'}.`);
    else if (!drawing.unitsKnown)
      problems.push(`${drawing.originalName} declares no units and none were chosen, so its sizes mean nothing yet.`);
  }
  if (drawings.length > 0 && parts.length === 0) problems.push('The drawings gave no parts.');
  return result(
    'drawing',
    'Drawing analysed',
    problems,
    `${plural(drawings.length, 'drawing')}, ${plural(parts.length, 'part')}`,
  );
}

/**
 * Every part has a material, a thickness above zero and a count of at least one, and fits the stock
 * it is cut from: sheet parts a 2440 × 1220 mm sheet and linear parts a 2400 mm bar, grain and kerf
 * counted, as the plan page lays them out (the core's defaults); solid parts, on their rough size
 * with the usual milling allowance, the longest and thickest board above.
 */
function cutListCheck({ parts }: ChecklistInput): CheckResult {
  const problems: string[] = [];
  for (const part of parts) {
    if (part.material.trim() === '') problems.push(`${part.name} has no material.`);
    if (!(part.thickness > 0)) problems.push(`${part.name} has no thickness.`);
    if (!(part.quantity >= 1))
      problems.push(`${part.name} is needed ${part.quantity} times; at least once makes sense.`);
    if (part.stock === 'solid') {
      const rough = {
        length: part.length + DEFAULT_ALLOWANCES.solid.length,
        thickness: part.thickness + DEFAULT_ALLOWANCES.solid.thickness,
      };
      if (rough.length > LONGEST_BOARD_MM + 1e-6)
        problems.push(
          `${part.name} needs a board ${mm(rough.length)} long (rough), longer than the 16 ft (${mm(LONGEST_BOARD_MM)}) boards on sale.`,
        );
      if (rough.thickness > THICKEST_BOARD_MM + 1e-6)
        problems.push(
          `${part.name} needs stock ${mm(rough.thickness)} thick (rough), thicker than 16/4 (${mm(THICKEST_BOARD_MM)}) boards.`,
        );
    }
  }
  const cutList = buildCutList(
    parts.filter((part) => part.quantity >= 1),
    { kerf: DEFAULT_KERF },
  );
  for (const group of cutList.groups) {
    for (const piece of group.sheets?.unplaced ?? [])
      problems.push(
        `${piece.name} (${group.material}, ${mm(piece.length)} × ${mm(piece.width)}) does not fit a ${DEFAULT_SHEET.length} × ${DEFAULT_SHEET.width} mm sheet${piece.grain === 'any' ? '' : ' with its grain'}.`,
      );
    for (const piece of group.bars?.unplaced ?? [])
      problems.push(
        `${piece.name} (${group.material}, ${mm(piece.length)}) is longer than a ${Math.max(...DEFAULT_BAR_LENGTHS)} mm bar.`,
      );
  }
  const pieces = parts.reduce((sum, part) => sum + Math.max(part.quantity, 0), 0);
  return result(
    'cut-list',
    'Cut list sane',
    problems,
    parts.length === 0
      ? 'No parts to check'
      : `${plural(pieces, 'piece')} in ${plural(cutList.groups.length, 'material')}`,
  );
}

function safetyCheck({ plan, safetyNotes }: ChecklistInput): CheckResult {
  const power = plan.tools.filter((tool) => !HAND_TOOLS.includes(tool)).map((tool) => tool.replace(/-/g, ' '));
  const because = [
    ...(plan.motorised ? ['is motorised'] : []),
    ...(power.length > 0 ? [`needs power tools (${power.join(', ')})`] : []),
  ].join(' and ');
  if (because === '') return result('safety-notes', 'Safety notes', [], 'Not needed: hand tools only and no motor');
  const present = safetyNotes.trim() !== '';
  return result(
    'safety-notes',
    'Safety notes',
    present ? [] : [`The plan ${because}, but has no safety notes.`],
    `${present ? 'Present' : 'Missing'}; needed because the plan ${because}`,
  );
}

function licenceCheck({ plan }: ChecklistInput): CheckResult {
  const known = (LICENCES as readonly string[]).includes(plan.licence);
  return result(
    'licence',
    'Licence stated',
    known ? [] : [`"${plan.licence}" is not one of the open licences the site offers.`],
    known ? plan.licence : 'No open licence',
  );
}

/** The checklist of one submission: every check with what it found. */
export function reviewChecklist(input: ChecklistInput): CheckResult[] {
  return [drawingCheck(input), cutListCheck(input), safetyCheck(input), licenceCheck(input)];
}
