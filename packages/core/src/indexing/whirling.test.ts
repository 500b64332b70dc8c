import { describe, expect, it } from 'vitest';
import { FIXITY_LAMBDA_SQUARED, STEEL, WHIRLING_SAFE_FRACTION, whirlingSpeedRpm } from './whirling';

// REFERENCES.md, Motion: f = λ²/(2πL²)·√(EI/ρA) [memory: Blevins, table of beam modes], steel
// E = 206 GPa, ρ = 7850 kg/m³, and the cross-check values [derived].
describe('whirlingSpeedRpm', () => {
  const screw = { rootDiameter: 12.5, length: 500, fixity: 'fixed-pinned' as const };

  it('gives about 9,430 rpm for d = 12.5 mm, L = 500 mm, fixed-pinned [derived]', () => {
    expect(Math.abs(whirlingSpeedRpm(screw) - 9430)).toBeLessThan(10);
  });

  it('agrees at 80 % with the common form n = f_c·d/L²·10⁷, f_c = 15.1, which has the 0.8 factor built in [derived]', () => {
    const commonForm = ((15.1 * screw.rootDiameter) / screw.length ** 2) * 1e7;
    expect(commonForm).toBeCloseTo(7550, 6);
    const ours = whirlingSpeedRpm(screw) * WHIRLING_SAFE_FRACTION;
    expect(Math.abs(ours - commonForm) / commonForm).toBeLessThan(0.005);
  });

  it('uses the λ² of the end fixity: 3.516, 9.870, 15.42, 22.37 [memory: Blevins]', () => {
    expect(FIXITY_LAMBDA_SQUARED).toEqual({
      'fixed-free': 3.516,
      'pinned-pinned': 9.87,
      'fixed-pinned': 15.42,
      'fixed-fixed': 22.37,
    });
    const pinned = whirlingSpeedRpm({ ...screw, fixity: 'pinned-pinned' });
    const fixed = whirlingSpeedRpm({ ...screw, fixity: 'fixed-fixed' });
    expect(fixed / pinned).toBeCloseTo(22.37 / 9.87, 10);
  });

  it('scales with d and with 1/L², as a beam does [derived]', () => {
    const base = whirlingSpeedRpm(screw);
    expect(whirlingSpeedRpm({ ...screw, rootDiameter: 25 }) / base).toBeCloseTo(2, 10);
    expect(whirlingSpeedRpm({ ...screw, length: 1000 }) / base).toBeCloseTo(0.25, 10);
  });

  it('takes another material through the options', () => {
    const light = { youngsModulus: STEEL.youngsModulus, density: STEEL.density / 4 };
    expect(whirlingSpeedRpm(screw, { material: light }) / whirlingSpeedRpm(screw)).toBeCloseTo(2, 10);
  });
});
