import { boardFeet, buildCutList, type CutListPart } from '@jigwright/core';
import { describe, expect, it } from 'vitest';
import type { ShopProfileValues } from './api/shop-profile';
import { cutListOptionsOf } from './shop-profile-options';

const profile: ShopProfileValues = {
  kerf: 2.4,
  edgeTrim: 10,
  sheets: [{ length: 2440, width: 1220 }],
  barLengths: [2000],
  solidAllowance: { length: 0, width: 0, thickness: 0 },
  currency: 'EUR',
  prices: [
    { material: 'baltic  birch plywood', per: 'sheet', amount: 60 },
    { material: '*', per: 'board-foot', amount: 5 },
    { material: 'Aluminium T-track', per: 'metre', amount: 12.5 },
  ],
};

const part = (name: string, material: string, stock: CutListPart['stock'], size: [number, number, number]) =>
  ({
    name,
    material,
    stock,
    quantity: 1,
    length: size[0],
    width: size[1],
    thickness: size[2],
    grain: 'any',
  }) as CutListPart;

describe('cutListOptionsOf', () => {
  it('files each price under the plan’s spelling of the material, and * under any', () => {
    const options = cutListOptionsOf(profile, ['Baltic birch plywood', 'Hard maple', 'Aluminium T-track']);
    expect(options.prices).toEqual({
      perSheet: { 'Baltic birch plywood': 60 },
      perBoardFoot: { '*': 5 },
      perMetre: { 'Aluminium T-track': 12.5 },
    });
    expect(options).toMatchObject({
      kerf: 2.4,
      edgeTrim: 10,
      barLengths: [2000],
      allowances: { solid: profile.solidAllowance },
    });
  });

  it('prices a cut list: one sheet, a metre of track, and maple by the board foot on its finished size', () => {
    const parts = [
      part('Base', 'Baltic birch plywood', 'sheet', [600, 400, 18]),
      part('Runner', 'Hard maple', 'solid', [610, 19, 25.4]),
      part('Track', 'Aluminium T-track', 'linear', [1000, 19, 9.5]),
    ];
    const cutList = buildCutList(
      parts,
      cutListOptionsOf(profile, ['Baltic birch plywood', 'Hard maple', 'Aluminium T-track']),
    );
    // With no allowance the rough size is the finished size; board feet per the core's boardFeet (REFERENCES.md).
    const maple = boardFeet(25.4, 19, 610) * 5;
    const byMaterial = (material: string) => cutList.groups.find((group) => group.material === material)?.cost;
    expect(byMaterial('Baltic birch plywood')).toBe(60);
    expect(byMaterial('Hard maple')).toBeCloseTo(maple, 6);
    // Bars are bought whole: one 2 m bar at 12.50 a metre.
    expect(byMaterial('Aluminium T-track')).toBeCloseTo(25, 6);
    expect(cutList.cost).toBeCloseTo(60 + maple + 25, 6);
  });
});
