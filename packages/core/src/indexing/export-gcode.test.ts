import { parseStringSync, type GcodeWord } from 'gcode-parser';
import { describe, expect, it } from 'vitest';
import { POWERED_CUTTER_CAUTION } from './caution';
import { jointGcode } from './export-gcode';
import { planJoint, type JointPlan } from './plan-joint';
import type { JointInput } from './joint-input';

function planOf(input: JointInput): JointPlan {
  const outcome = planJoint(input);
  if (!outcome.ok) throw new Error(JSON.stringify(outcome.errors));
  return outcome.plan;
}

const codes = (words: GcodeWord[]): string[] =>
  words.filter(([letter]) => letter === 'G' || letter === 'M').map(([letter, value]) => `${letter}${value}`);

// Re-parsed with a general-purpose G-code parser from npm. Modal groups from NIST RS274NGC v3
// (NISTIR 6556) [read]: G21 units mm (group 6), G90 absolute (group 3), G0/G1 motion (group 1);
// M0 pause, M2 end, F in units per minute [memory, §3.5–3.7].
describe('jointGcode', () => {
  const plan = planOf({ width: 100, pin: 10, slot: 8, kerf: 3.2, start: 'slot', lead: 5, microsteps: 16 });
  const lines = parseStringSync(jointGcode(plan, 'A'));
  const coded = lines.filter((line) => line.words.length > 0);

  it('sets millimetres and absolute mode before the first move', () => {
    const firstMove = coded.findIndex((line) => codes(line.words).some((code) => code === 'G0' || code === 'G1'));
    const setup = coded.slice(0, firstMove).flatMap((line) => codes(line.words));
    expect(setup).toContain('G21');
    expect(setup).toContain('G90');
    expect(setup).not.toContain('G20');
    expect(setup).not.toContain('G91');
  });

  it('moves to every pass of the board in order, each followed by an M0 pause', () => {
    const xs = coded.flatMap((line) =>
      line.words.filter(([letter]) => letter === 'X').map(([, value]) => Number(value)),
    );
    const expected = plan.boards.A.passes.map((pass) => pass.position);
    expect(xs).toHaveLength(expected.length);
    xs.forEach((x, index) => expect(x).toBeCloseTo(expected[index] ?? Number.NaN, 4));
    const sequence = coded.flatMap((line) => codes(line.words)).filter((code) => code !== 'G21' && code !== 'G90');
    expect(sequence.slice(0, -1)).toEqual(expected.flatMap(() => ['G0', 'M0']));
  });

  it('ends with M2', () => {
    expect(codes(coded.at(-1)?.words ?? [])).toEqual(['M2']);
  });

  it('opens with a comment naming the board and the cautions', () => {
    const comments = lines.flatMap((line) => line.comments ?? []).join(' ');
    expect(comments).toContain('board A');
    expect(comments).toContain(POWERED_CUTTER_CAUTION.heading);
    expect(comments).toContain('OSHA 29 CFR 1910.213');
  });

  it('writes plain ASCII lines a small controller accepts', () => {
    const text = jointGcode(plan, 'B');
    expect(text).toMatch(/^[\x20-\x7E\n]*$/);
    expect(Math.max(...text.split('\n').map((line) => line.length))).toBeLessThanOrEqual(80);
  });

  it('feeds at the top carriage speed, set before the first G1, when the screw or step rate limits it', () => {
    const limited = planOf({
      width: 60,
      pin: 10,
      kerf: 5,
      lead: 5,
      microsteps: 16,
      maxStepRate: 20_000,
      backlash: 0.05,
    });
    const parsed = parseStringSync(jointGcode(limited, 'B')).filter((line) => line.words.length > 0);
    const firstFeed = parsed.findIndex((line) => line.words.some(([letter]) => letter === 'F'));
    const firstG1 = parsed.findIndex((line) => codes(line.words).includes('G1'));
    expect(firstFeed).toBeGreaterThanOrEqual(0);
    expect(firstFeed).toBeLessThan(firstG1);
    expect(parsed[firstFeed]?.words).toContainEqual(['F', 1875]);
    // The take-up move comes first, below the first pass by the backlash.
    const xs = parsed.flatMap((line) =>
      line.words.filter(([letter]) => letter === 'X').map(([, value]) => Number(value)),
    );
    expect(xs[0]).toBeCloseTo((limited.boards.B.passes[0]?.position ?? Number.NaN) - 0.05, 4);
    expect(xs.slice(1)).toHaveLength(limited.boards.B.passes.length);
  });
});
