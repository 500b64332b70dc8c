import { parseArgs } from 'node:util';
import {
  POWERED_CUTTER_CAUTION,
  jointCHeader,
  jointCsv,
  jointGcode,
  planJoint,
  type BoardName,
  type JointField,
  type JointFieldError,
  type JointInput,
  type JointPlan,
  type SymmetrySuggestion,
} from '../../indexing';
import { fixed, plain } from '../../indexing/export-text';
import { mmToInches } from '../../units/length';
import type { CommandIo } from '../main';

const usage = `Usage: jigwright joint --width W --pin P [--slot S] --kerf K [options]

Lays out a finger (box) joint across two mating boards and the indexing moves of a lead-screw jig.
Lengths are in --units (mm or in; "3/4" and "1-1/2" are read as fractions); output is in mm.

Layout:
  --width W            board width
  --pin P              width of board A's pins (board B's slots)
  --slot S             width of board A's slots (board B's pins); default P
  --kerf K             blade kerf or dado/bit width
  --start pin|slot     what board A starts with at its left edge; default pin
  --units mm|in        units of every length except the lead; default mm
Drive (steps are computed when --lead or --tpi is given):
  --lead L             screw lead, mm per revolution
  --tpi N              threads per inch of a single-start screw, instead of --lead
  --steps-per-rev N    full steps per motor revolution; default 200
  --step-angle DEG     motor step angle, instead of --steps-per-rev
  --microsteps M       driver microstepping, 1-256; default 1
  --backlash B         backlash of the drive; every pass is then approached moving up
  --root-diameter D    screw root diameter   } both give the whirling speed
  --screw-length L     length between bearings }
  --fixity F           fixed-free, pinned-pinned (default), fixed-pinned or fixed-fixed
  --max-step-rate R    controller's highest step rate, steps per second
Output (one of; default a readable summary):
  --json               the whole plan as JSON
  --csv                the cut sequence of both boards as CSV
  --gcode A|B          one board's G-code program
  --header             a C header with the step tables
`;

const options = {
  width: { type: 'string' },
  pin: { type: 'string' },
  slot: { type: 'string' },
  kerf: { type: 'string' },
  start: { type: 'string' },
  units: { type: 'string' },
  lead: { type: 'string' },
  tpi: { type: 'string' },
  'steps-per-rev': { type: 'string' },
  'step-angle': { type: 'string' },
  microsteps: { type: 'string' },
  backlash: { type: 'string' },
  'root-diameter': { type: 'string' },
  'screw-length': { type: 'string' },
  fixity: { type: 'string' },
  'max-step-rate': { type: 'string' },
  json: { type: 'boolean' },
  csv: { type: 'boolean' },
  gcode: { type: 'string' },
  header: { type: 'boolean' },
  help: { type: 'boolean', short: 'h' },
} as const;

type Values = ReturnType<typeof parseArgs<{ options: typeof options; args: string[] }>>['values'];

const NUMBER_FLAGS = {
  width: 'width',
  pin: 'pin',
  slot: 'slot',
  kerf: 'kerf',
  lead: 'lead',
  threadsPerInch: 'tpi',
  stepsPerRev: 'steps-per-rev',
  stepAngle: 'step-angle',
  microsteps: 'microsteps',
  backlash: 'backlash',
  rootDiameter: 'root-diameter',
  screwLength: 'screw-length',
  maxStepRate: 'max-step-rate',
} as const satisfies Partial<Record<JointField, keyof typeof options>>;

const FLAG_OF: Record<JointField, string> = { ...NUMBER_FLAGS, units: 'units', start: 'start', fixity: 'fixity' };

class UsageError extends Error {}

/** A number as woodworkers write it: "19.05", "3/4", "1-1/2" or "1 1/2". */
export function parseMeasure(text: string): number {
  const match = /^\s*(?:(\d+)[\s-]+)?(\d+)\/(\d+)\s*$/.exec(text);
  if (match) {
    const [, whole = '0', numerator = '', denominator = ''] = match;
    return Number(whole) + Number(numerator) / Number(denominator);
  }
  return text.trim() === '' ? Number.NaN : Number(text);
}

function toInput(values: Values): JointInput {
  const numbers = Object.entries(NUMBER_FLAGS).flatMap(([field, flag]) => {
    const text = values[flag];
    if (text === undefined) return [];
    const value = parseMeasure(text);
    if (!Number.isFinite(value)) throw new UsageError(`--${flag}: "${text}" is not a number`);
    return [[field, value]];
  });
  // Width, pin and kerf stay missing when not given, so that the check names them.
  return {
    ...Object.fromEntries(numbers),
    ...(values.units === undefined ? {} : { units: values.units }),
    ...(values.start === undefined ? {} : { start: values.start }),
    ...(values.fixity === undefined ? {} : { fixity: values.fixity }),
  } as JointInput;
}

function errorLine(errors: JointFieldError[]): string {
  return errors.map((error) => `--${FLAG_OF[error.field]}: ${error.message}`).join(' ');
}

function boardOf(text: string): BoardName {
  const board = text.toUpperCase();
  if (board !== 'A' && board !== 'B') throw new UsageError(`--gcode: the board is A or B, not "${text}"`);
  return board;
}

/** Numbers without float noise, so that 12.700000000000001 prints as 12.7. */
function cleanNumbers(_key: string, value: unknown): unknown {
  return typeof value === 'number' && !Number.isInteger(value) ? Number(plain(value)) : value;
}

function suggestionLine(suggestion: SymmetrySuggestion): string {
  const what =
    suggestion.change === 'width'
      ? `width ${plain(suggestion.width)} mm`
      : `pin ${plain(suggestion.pin)} mm, slot ${plain(suggestion.slot)} mm`;
  return `  ${what}: ${suggestion.pins} pins and ${suggestion.slots} slots on board A, a ${suggestion.edges} at both edges`;
}

function summary(plan: JointPlan): string {
  const { drive } = plan;
  const boardLines = (['A', 'B'] as const).flatMap((name) => {
    const board = plan.boards[name];
    return [
      `Board ${name} (starts with a ${board.startsWith}): ${board.slots.length} slots, ${board.passes.length} passes`,
      '   slot  pass  position mm  position in     steps',
      ...board.passes.map(
        (pass) =>
          `  ${String(pass.slot).padStart(5)} ${String(pass.pass).padStart(5)} ${fixed(pass.position, 4).padStart(12)}` +
          ` ${fixed(mmToInches(pass.position), 5).padStart(12)} ${String(pass.steps ?? '-').padStart(9)}`,
      ),
    ];
  });
  const driveLines =
    drive === null
      ? ['Drive: not given (add --lead or --tpi for steps)']
      : [
          `Drive: ${plain(plan.stepsPerMm ?? 0)} steps/mm, ${plain(plan.resolution ?? 0)} mm/step, ` +
            `largest rounding error ${fixed(plan.maxRoundingError ?? 0, 5)} mm, travel ${fixed(drive.travel.length, 2)} mm`,
          ...(drive.approach === null ? [] : [`Backlash: ${drive.approach.rule}`]),
          ...(drive.whirling === null
            ? []
            : [
                `Whirling: critical ${Math.round(drive.whirling.criticalRpm)} rpm (${drive.whirling.fixity}), ` +
                  `run at most ${Math.round(drive.whirling.safeRpm)} rpm = ${Math.floor(drive.whirling.topSpeed)} mm/min`,
              ]),
          ...(drive.stepRateTopSpeed === null ? [] : [`Step rate allows ${Math.floor(drive.stepRateTopSpeed)} mm/min`]),
        ];
  return [
    `Finger joint: width ${plain(plan.width)} mm, pin ${plain(plan.pin)} mm, slot ${plain(plan.slot)} mm, kerf ${plain(plan.kerf)} mm`,
    ...driveLines,
    '',
    ...boardLines,
    ...plan.warnings.map((warning) => `Note: ${warning.message}`),
    ...(plan.symmetry.length === 0
      ? []
      : ['Symmetric alternatives (not applied):', ...plan.symmetry.map(suggestionLine)]),
    '',
    `${POWERED_CUTTER_CAUTION.heading}:`,
    ...POWERED_CUTTER_CAUTION.points.map((point) => `  - ${point}`),
    `  (${POWERED_CUTTER_CAUTION.sources.join('; ')})`,
    '',
  ].join('\n');
}

function render(plan: JointPlan, values: Values): string {
  if (values.json) return `${JSON.stringify({ ...plan, caution: POWERED_CUTTER_CAUTION }, cleanNumbers, 2)}\n`;
  if (values.csv) return jointCsv(plan);
  if (values.gcode !== undefined) return jointGcode(plan, boardOf(values.gcode));
  if (values.header) {
    const header = jointCHeader(plan);
    if (!header.ok) throw new UsageError(errorLine(header.errors));
    return header.text;
  }
  return summary(plan);
}

function run(args: string[], io: CommandIo): number {
  const { values } = parseArgs({ args, options, strict: true, allowPositionals: false });
  if (values.help) {
    io.stdout(usage);
    return 0;
  }
  const outputs = [values.json, values.csv, values.gcode !== undefined, values.header].filter(Boolean);
  if (outputs.length > 1) throw new UsageError('choose one of --json, --csv, --gcode and --header');
  const outcome = planJoint(toInput(values));
  if (!outcome.ok) throw new UsageError(errorLine(outcome.errors));
  io.stdout(render(outcome.plan, values));
  return 0;
}

export async function jointCommand(args: string[], io: CommandIo): Promise<number> {
  try {
    return run(args, io);
  } catch (error) {
    // parseArgs reports unknown options and missing values as TypeErrors with an ERR_PARSE_ARGS code.
    const isParseError =
      error instanceof TypeError && 'code' in error && String(error.code).startsWith('ERR_PARSE_ARGS');
    if (!(error instanceof UsageError) && !isParseError) throw error;
    io.stderr(`jigwright joint: ${error.message.split('\n')[0]}\n`);
    return 2;
  }
}
