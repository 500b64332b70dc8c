import { parseStringSync } from 'gcode-parser';
import { describe, expect, it } from 'vitest';
import { main } from '../main';
import { parseMeasure } from './joint';

interface Run {
  code: number;
  stdout: string;
  stderr: string;
}

async function jigwright(...args: string[]): Promise<Run> {
  const out: string[] = [];
  const err: string[] = [];
  const code = await main(['joint', ...args], { stdout: (text) => out.push(text), stderr: (text) => err.push(text) });
  return { code, stdout: out.join(''), stderr: err.join('') };
}

interface JsonPass {
  position: number;
  steps: number;
}
interface JsonPlan {
  boards: Record<'A' | 'B', { slots: Array<[number, number]>; passes: JsonPass[] }>;
  stepsPerMm: number;
  resolution: number;
  maxRoundingError: number;
  caution: { points: string[] };
}

const layout = ['--width', '100', '--pin', '10', '--kerf', '3.2'];

describe('jigwright joint', () => {
  // REFERENCES.md, Motion [derived]: 200 × 16 / 5 = 640 steps/mm, 0.0015625 mm/step.
  it('prints the plan as JSON in the shape of the issue [derived: 640 steps/mm]', async () => {
    const run = await jigwright(...layout, '--lead', '5', '--steps-per-rev', '200', '--microsteps', '16', '--json');
    expect(run.code).toBe(0);
    const plan = JSON.parse(run.stdout) as JsonPlan;
    expect(plan.stepsPerMm).toBe(640);
    expect(plan.resolution).toBe(0.0015625);
    expect(plan.maxRoundingError).toBeLessThanOrEqual(0.0015625 / 2);
    expect(plan.boards.A.slots[0]).toEqual([10, 20]);
    expect(plan.boards.B.slots[0]).toEqual([0, 10]);
    for (const board of [plan.boards.A, plan.boards.B]) {
      const positions = board.passes.map((pass) => pass.position);
      expect(positions).toEqual([...positions].sort((a, b) => a - b));
      board.passes.forEach((pass) => expect(pass.steps).toBe(Math.round(pass.position * 640)));
    }
    expect(plan.caution.points.length).toBeGreaterThan(0);
  });

  // REFERENCES.md, Units [read]: 1 in = 25.4 mm exactly.
  it('reads inches and fractions and answers in mm', async () => {
    const run = await jigwright(
      '--units',
      'in',
      '--width',
      '4',
      '--pin',
      '3/4',
      '--kerf',
      '1/8',
      '--tpi',
      '10',
      '--json',
    );
    const plan = JSON.parse(run.stdout) as JsonPlan;
    expect(plan.boards.A.slots[0]).toEqual([19.05, 38.1]);
    // ¾ in on a 0.1 in lead is 1500 full steps [derived].
    expect(plan.boards.A.passes[0]).toMatchObject({ position: 19.05, steps: 1500 });
  });

  it('writes one board’s G-code program', async () => {
    const run = await jigwright(...layout, '--gcode', 'b');
    const words = parseStringSync(run.stdout).flatMap((line) =>
      line.words.map(([letter, value]) => `${letter}${value}`),
    );
    expect(words.slice(0, 2)).toEqual(['G21', 'G90']);
    expect(words).toContain('X0');
    expect(words.at(-1)).toBe('M2');
  });

  it('writes the CSV and the C header', async () => {
    const csv = await jigwright(...layout, '--lead', '8', '--csv');
    expect(csv.stdout.split('\r\n')[0]).toBe('board,slot,pass,position_mm,position_in,steps');
    expect(csv.stdout.trim().split('\r\n')).toHaveLength(41);
    const header = await jigwright(...layout, '--lead', '8', '--microsteps', '16', '--header');
    expect(header.stdout).toContain('400 steps per mm');
    expect(header.stdout).toContain('static const long joint_board_a_steps');
  });

  it('prints a readable summary with the cautions by default', async () => {
    const run = await jigwright(...layout, '--lead', '5');
    expect(run.code).toBe(0);
    expect(run.stdout).toContain('Board A (starts with a pin): 5 slots, 20 passes');
    expect(run.stdout).toContain('Caution: powered saw or router');
    expect(run.stdout).toContain('OSHA 29 CFR 1910.213');
  });

  it.each([
    [['--pin', '10', '--kerf', '3'], '--width: Board width is required.'],
    [
      [...layout.slice(0, 4), '--slot', '5', '--kerf', '8'],
      "--kerf: The cutter (8 mm) is wider than board A's slots (5 mm).",
    ],
    [[...layout, '--width', 'wide'], '--width: "wide" is not a number'],
    [[...layout, '--microsteps', '1000'], '--microsteps: Microstepping must be a whole number from 1 to 256.'],
    [[...layout, '--gcode', 'C'], '--gcode: the board is A or B, not "C"'],
    [[...layout, '--header'], '--lead: The step table needs the screw lead.'],
    [[...layout, '--csv', '--json'], 'choose one of --json, --csv, --gcode and --header'],
    [[...layout, '--colour', 'red'], "Unknown option '--colour'"],
  ])('refuses %j with exit code 2 and one line on stderr', async (args, message) => {
    const run = await jigwright(...args);
    expect(run.code).toBe(2);
    expect(run.stdout).toBe('');
    expect(run.stderr).toBe(`jigwright joint: ${message}\n`);
  });

  it('prints its options with --help', async () => {
    const run = await jigwright('--help');
    expect(run.code).toBe(0);
    expect(run.stdout).toContain('--steps-per-rev N');
  });
});

describe('parseMeasure', () => {
  it('reads decimals and shop fractions', () => {
    expect(parseMeasure('19.05')).toBe(19.05);
    expect(parseMeasure('3/4')).toBe(0.75);
    expect(parseMeasure('1-1/2')).toBe(1.5);
    expect(parseMeasure('1 1/2')).toBe(1.5);
    expect(parseMeasure('')).toBeNaN();
    expect(parseMeasure('1/2/3')).toBeNaN();
  });
});
