import { describe, expect, it } from 'vitest';
import type { ShopProfileValues } from './api/shop-profile';
import { fromForm, readLength, toForm } from './shop-profile-form';

const saved: ShopProfileValues = {
  kerf: 3.2,
  edgeTrim: 0,
  sheets: [{ length: 2440, width: 1220 }],
  barLengths: [2400],
  solidAllowance: { length: 25, width: 6, thickness: 3 },
  currency: 'EUR',
  prices: [{ material: 'Baltic birch plywood', per: 'sheet', amount: 58.5 }],
};

describe('the shop-profile form', () => {
  it('reads inches as decimals or fractions, 1 in = 25.4 mm exactly (NIST SP 811, B.8)', () => {
    expect(readLength('1/8', 'in')).toBeCloseTo(3.175, 9);
    expect(readLength('48', 'in')).toBeCloseTo(1219.2, 9);
    expect(readLength('1-1/2', 'in')).toBeCloseTo(38.1, 9);
    expect(readLength('3,2', 'mm')).toBe(3.2);
    expect(readLength('3 mm', 'mm')).toBeUndefined();
  });

  it('gives back the saved profile unchanged when nothing was retyped, in either units', () => {
    expect(fromForm(toForm(saved, 'mm'), saved, 'mm')).toEqual({ values: saved });
    // In inches 3.2 mm shows as 1/8; untouched, it stays 3.2 mm rather than becoming 3.175 mm.
    const inches = toForm(saved, 'in');
    expect(inches.kerf).toBe('1/8');
    expect(fromForm(inches, saved, 'in')).toEqual({ values: saved });
  });

  it('takes a retyped length in the member’s units', () => {
    const form = { ...toForm(saved, 'in'), kerf: '3/32', sheets: [{ length: '96', width: '48' }] };
    const result = fromForm(form, saved, 'in');
    expect(result.errors).toBeUndefined();
    if (!result.errors) {
      expect(result.values.kerf).toBeCloseTo(2.38125, 9);
      expect(result.values.sheets[0]?.length).toBeCloseTo(2438.4, 9);
      expect(result.values.sheets[0]?.width).toBeCloseTo(1219.2, 9);
    }
  });

  it('names every wrong field at once', () => {
    const form = {
      ...toForm(saved, 'mm'),
      kerf: 'thin',
      sheets: [{ length: '2440', width: '50' }],
      currency: 'euro',
      prices: [
        { material: 'Oak', per: 'board-foot' as const, amount: '9' },
        { material: 'oak', per: 'board-foot' as const, amount: '9.999' },
      ],
    };
    const result = fromForm(form, saved, 'mm');
    expect(Object.keys(result.errors ?? {}).sort()).toEqual([
      'currency',
      'kerf',
      'prices.1.amount',
      'prices.1.material',
      'sheets.0.width',
    ]);
    expect(result.errors?.['sheets.0.width']).toBe('Between 100 mm and 6000 mm.');
    expect(result.errors?.['prices.1.material']).toContain('(row 1)');
  });
});
