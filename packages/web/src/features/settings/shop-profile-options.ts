import type { CutListOptions } from '@jigwright/core';
import type { ShopProfileValues } from './api/shop-profile';

const PRICE_KEYS = { sheet: 'perSheet', 'board-foot': 'perBoardFoot', metre: 'perMetre' } as const;

const sameMaterial = (a: string, b: string) =>
  a.trim().replace(/\s+/g, ' ').toLowerCase() === b.trim().replace(/\s+/g, ' ').toLowerCase();

/**
 * The cut list's options from a shop profile: kerf, trim, stock sizes, the solid-stock allowance
 * and prices. A price is filed under the plan's own spelling of the material ("baltic birch
 * plywood" prices the plan's "Baltic birch plywood"); `*` prices any material without its own.
 */
export function cutListOptionsOf(profile: ShopProfileValues, planMaterials: readonly string[]): CutListOptions {
  const prices = { perSheet: {}, perBoardFoot: {}, perMetre: {} } as Record<
    (typeof PRICE_KEYS)[keyof typeof PRICE_KEYS],
    Record<string, number>
  >;
  for (const price of profile.prices) {
    const table = prices[PRICE_KEYS[price.per]];
    if (price.material === '*') table['*'] = price.amount;
    else
      for (const material of planMaterials) if (sameMaterial(material, price.material)) table[material] = price.amount;
  }
  return {
    kerf: profile.kerf,
    edgeTrim: profile.edgeTrim,
    sheets: profile.sheets,
    barLengths: profile.barLengths,
    allowances: { solid: profile.solidAllowance },
    prices,
  };
}
