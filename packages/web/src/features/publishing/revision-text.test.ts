import { describe, expect, it } from 'vitest';
import type { HardwareRow, RevisionText } from './api/types';
import { hardwareRowErrors, moveRow, sameText, textToSave } from './revision-text';

const screw: HardwareRow = { item: 'Wood screw', specification: '4 × 30 mm', quantity: 6, note: '' };
const track: HardwareRow = { item: 'T-track', specification: '600 mm', quantity: 1, note: 'cut to length' };
const text: RevisionText = {
  changelog: '',
  notes: '# Build',
  safetyNotes: 'Use a push stick.',
  hardware: [screw, track],
};

describe('the revision text', () => {
  it('moves a hardware row up and down, and not past either end, without touching the list it was given', () => {
    const rows = [screw, track];
    expect(moveRow(rows, 1, -1)).toEqual([track, screw]);
    expect(moveRow(rows, 0, 1)).toEqual([track, screw]);
    expect(moveRow(rows, 0, -1)).toEqual([screw, track]);
    expect(moveRow(rows, 1, 1)).toEqual([screw, track]);
    expect(rows).toEqual([screw, track]);
  });

  it('tells a changed text from the saved one, hardware order included', () => {
    expect(sameText(text, { ...text, hardware: [{ ...screw }, { ...track }] })).toBe(true);
    expect(sameText(text, { ...text, hardware: [track, screw] })).toBe(false);
    expect(sameText(text, { ...text, notes: '# Build\n' })).toBe(false);
  });

  it('holds back a hardware row without an item or with a count that is not a whole number from 1', () => {
    expect(hardwareRowErrors({ ...screw, item: '  ' }).item).toBeDefined();
    expect(hardwareRowErrors({ ...screw, quantity: 0 }).quantity).toBeDefined();
    expect(hardwareRowErrors({ ...screw, quantity: Number.NaN }).quantity).toBeDefined();
    expect(hardwareRowErrors(screw)).toEqual({});
    expect(textToSave({ ...text, hardware: [{ ...screw, quantity: 1.5 }] })).toBeNull();
  });

  it('trims the hardware rows it saves', () => {
    const saved = textToSave({
      ...text,
      hardware: [{ item: ' Bearing ', specification: ' 608 ', quantity: 2, note: ' ' }],
    });
    expect(saved?.hardware).toEqual([{ item: 'Bearing', specification: '608', quantity: 2, note: '' }]);
  });
});
