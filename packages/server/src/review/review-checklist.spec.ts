import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { TOOLS } from '../plans/vocabulary';
import {
  HAND_TOOLS,
  LONGEST_BOARD_MM,
  reviewChecklist,
  THICKEST_BOARD_MM,
  type ChecklistInput,
  type ChecklistPart,
  type ReviewCheck,
} from './review-checklist';

const vocabulary = JSON.parse(readFileSync(join(__dirname, '../../../../plans-seed/vocabulary.json'), 'utf8')) as {
  tools: Array<{ id: string; power: boolean }>;
};

const part = (changes: Partial<ChecklistPart> = {}): ChecklistPart => ({
  name: 'Base',
  quantity: 1,
  length: 600,
  width: 450,
  thickness: 12,
  material: 'Baltic birch plywood',
  stock: 'sheet',
  grain: 'length',
  ...changes,
});

const input = (changes: Partial<ChecklistInput> = {}): ChecklistInput => ({
  plan: { motorised: false, tools: ['table-saw'], licence: 'CC-BY-4.0' },
  safetyNotes: 'Keep the blade guard on; push the sled from behind the fence.',
  drawings: [{ originalName: 'sled.dxf', status: 'done', error: null, unitsKnown: true }],
  parts: [part(), part({ name: 'Fence', length: 650, width: 90, thickness: 19, material: 'maple', stock: 'solid' })],
  ...changes,
});

const check = (of: ChecklistInput, name: ReviewCheck) => reviewChecklist(of).find((result) => result.check === name)!;

describe('the review checklist', () => {
  it('passes a complete submission on every check, saying what it found', () => {
    const checklist = reviewChecklist(input());
    expect(checklist.map((result) => [result.check, result.ok])).toEqual([
      ['drawing', true],
      ['cut-list', true],
      ['safety-notes', true],
      ['licence', true],
    ]);
    expect(checklist.flatMap((result) => result.problems)).toEqual([]);
    expect(check(input(), 'drawing').summary).toBe('1 drawing, 2 parts');
    expect(check(input(), 'cut-list').summary).toBe('2 pieces in 2 materials');
  });

  it('counts as power tools exactly those plans-seed/vocabulary.json marks as powered', () => {
    const hand = vocabulary.tools.filter((tool) => !tool.power).map((tool) => tool.id);
    expect([...HAND_TOOLS].sort()).toEqual(hand.sort());
    expect(HAND_TOOLS.every((tool) => (TOOLS as readonly string[]).includes(tool))).toBe(true);
  });

  describe('drawing analysed', () => {
    it('fails with no drawing, and with drawings that gave no parts', () => {
      expect(check(input({ drawings: [], parts: [] }), 'drawing').problems).toEqual(['No drawing is uploaded.']);
      expect(check(input({ parts: [] }), 'drawing').problems).toEqual(['The drawings gave no parts.']);
    });

    it('names each drawing still waiting, failed or without units', () => {
      const drawings: ChecklistInput['drawings'] = [
        { originalName: 'a.dxf', status: 'queued', error: null, unitsKnown: false },
        { originalName: 'b.dxf', status: 'analysing', error: null, unitsKnown: false },
        { originalName: 'c.dxf', status: 'failed', error: 'the file ends inside a section', unitsKnown: false },
        { originalName: 'd.dxf', status: 'done', error: null, unitsKnown: false },
        { originalName: 'e.dxf', status: 'done', error: null, unitsKnown: true },
      ];
      const result = check(input({ drawings }), 'drawing');
      expect(result.ok).toBe(false);
      expect(result.problems).toEqual([
        'a.dxf is still being analysed.',
        'b.dxf is still being analysed.',
        'The analysis of c.dxf failed: the file ends inside a section.',
        'd.dxf declares no units and none were chosen, so its sizes mean nothing yet.',
      ]);
    });
  });

  describe('cut list sane', () => {
    it('wants a material, a thickness above zero and at least one of each part', () => {
      const parts = [part({ name: 'Runner', material: '  ' }), part({ name: 'Stop', thickness: 0, quantity: 0 })];
      expect(check(input({ parts }), 'cut-list').problems).toEqual([
        'Runner has no material.',
        'Stop has no thickness.',
        'Stop is needed 0 times; at least once makes sense.',
      ]);
    });

    // Sheet: 2440 × 1220 mm, the metric trade size of PS 1 panels (REFERENCES.md, Units, lumber and
    // panels [read via a summary]); a piece takes its size plus one kerf, the sheet its size plus one.
    it('takes a whole 2440 × 1220 mm sheet, and refuses a part a millimetre longer', () => {
      expect(check(input({ parts: [part({ length: 2440, width: 1220 })] }), 'cut-list').ok).toBe(true);
      expect(check(input({ parts: [part({ name: 'Top', length: 2441, width: 600 })] }), 'cut-list').problems).toEqual([
        'Top (Baltic birch plywood, 2441 mm × 600 mm) does not fit a 2440 × 1220 mm sheet with its grain.',
      ]);
    });

    it('keeps a part to its grain on the sheet, and turns it when the grain allows', () => {
      // 1500 mm along the grain fits the sheet's length; across the grain it would need 1500 of 1220.
      const long = { length: 1500, width: 400 };
      expect(check(input({ parts: [part({ ...long, grain: 'length' })] }), 'cut-list').ok).toBe(true);
      expect(check(input({ parts: [part({ ...long, grain: 'width' })] }), 'cut-list').ok).toBe(false);
      expect(check(input({ parts: [part({ ...long, grain: 'any' })] }), 'cut-list').ok).toBe(true);
    });

    it('cuts linear stock from 2400 mm bars', () => {
      const bar = (length: number) =>
        part({ name: 'T-track', length, width: 19, material: 'aluminium', stock: 'linear' });
      expect(check(input({ parts: [bar(2400)] }), 'cut-list').ok).toBe(true);
      expect(check(input({ parts: [bar(2400.5)] }), 'cut-list').problems).toEqual([
        'T-track (aluminium, 2400.5 mm) is longer than a 2400 mm bar.',
      ]);
    });

    // 16 ft = 192 in × 25.4 mm = 4876.8 mm and 4 in = 101.6 mm [derived: 1 in = 25.4 mm exactly,
    // NBS 1959]; the rough size adds the usual 25 mm in length and 3 mm in thickness [common practice].
    it('holds solid parts on their rough size to a 16 ft board, 16/4 thick', () => {
      expect(LONGEST_BOARD_MM).toBeCloseTo(4876.8, 9);
      expect(THICKEST_BOARD_MM).toBeCloseTo(101.6, 9);
      const solid = (changes: Partial<ChecklistPart>) =>
        check(
          input({ parts: [part({ name: 'Rail', material: 'oak', stock: 'solid', width: 90, ...changes })] }),
          'cut-list',
        );
      expect(solid({ length: 4851.8, thickness: 98.6 }).ok).toBe(true);
      expect(solid({ length: 4852, thickness: 99 }).problems).toEqual([
        'Rail needs a board 4877 mm long (rough), longer than the 16 ft (4876.8 mm) boards on sale.',
        'Rail needs stock 102 mm thick (rough), thicker than 16/4 (101.6 mm) boards.',
      ]);
    });
  });

  describe('safety notes', () => {
    it('are needed for power tools and motors, and blank notes do not count', () => {
      const result = check(
        input({ plan: { motorised: true, tools: ['router'], licence: 'CC0-1.0' }, safetyNotes: ' \n ' }),
        'safety-notes',
      );
      expect(result.problems).toEqual([
        'The plan is motorised and needs power tools (router), but has no safety notes.',
      ]);
      expect(
        check(input({ plan: { motorised: true, tools: [], licence: 'CC0-1.0' }, safetyNotes: '' }), 'safety-notes').ok,
      ).toBe(false);
    });

    it('are not needed for hand tools only and no motor', () => {
      const result = check(
        input({ plan: { motorised: false, tools: ['hand-saw', 'hand-plane'], licence: 'CC0-1.0' }, safetyNotes: '' }),
        'safety-notes',
      );
      expect(result).toMatchObject({ ok: true, summary: 'Not needed: hand tools only and no motor' });
    });
  });

  it('wants one of the open licences', () => {
    expect(check(input(), 'licence')).toMatchObject({ ok: true, summary: 'CC-BY-4.0' });
    expect(check(input({ plan: { motorised: false, tools: [], licence: 'all rights reserved' } }), 'licence').ok).toBe(
      false,
    );
  });
});
