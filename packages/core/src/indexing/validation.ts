import { mmToInches } from '../units/length';
import { LENGTH_TOLERANCE_MM, type FingerLayout } from './finger-layout';
import type { JointField, JointFieldError, JointInput, JointSpec, JointUnits } from './joint-input';
import { boardPassCount } from './passes';
import { SCREW_FIXITIES } from './whirling';

/** More passes than this is a typing slip, not a joint; refusing it keeps every keystroke fast. */
export const MAX_PASSES = 10_000;

/** A C `long` is 32 bits on the small controllers the step table is for. */
export const MAX_STEP_COUNT = 2 ** 31 - 1;

type Check = (input: JointInput) => JointFieldError | null;

const isNumber = (value: unknown): value is number => typeof value === 'number' && Number.isFinite(value);

function fieldError(field: JointField, message: string): JointFieldError {
  return { field, message };
}

function positive(field: JointField, label: string, { required }: { required: boolean }): Check {
  return (input) => {
    const value = input[field];
    if (value === undefined) return required ? fieldError(field, `${label} is required.`) : null;
    if (!isNumber(value)) return fieldError(field, `${label} must be a number.`);
    return value > 0 ? null : fieldError(field, `${label} must be more than 0.`);
  };
}

function oneOf(field: JointField, label: string, allowed: readonly string[]): Check {
  return (input) => {
    const value = input[field];
    return value === undefined || allowed.includes(String(value))
      ? null
      : fieldError(field, `${label} must be one of ${allowed.join(', ')}.`);
  };
}

function wholeInRange(field: JointField, label: string, [min, max]: readonly [number, number]): Check {
  return (input) => {
    const value = input[field];
    if (value === undefined) return null;
    return isNumber(value) && Number.isInteger(value) && value >= min && value <= max
      ? null
      : fieldError(field, `${label} must be a whole number from ${min} to ${max}.`);
  };
}

function notBoth(field: JointField, other: JointField, message: string): Check {
  return (input) => (input[field] !== undefined && input[other] !== undefined ? fieldError(field, message) : null);
}

function needs(field: JointField, other: JointField, message: string): Check {
  return (input) => (input[field] !== undefined && input[other] === undefined ? fieldError(other, message) : null);
}

const checkStepAngle: Check = ({ stepAngle }) => {
  if (stepAngle === undefined) return null;
  if (!isNumber(stepAngle) || stepAngle <= 0 || stepAngle > 360) {
    return fieldError('stepAngle', 'Step angle must be more than 0° and at most 360°.');
  }
  const steps = 360 / stepAngle;
  return Math.abs(steps - Math.round(steps)) < 1e-6
    ? null
    : fieldError('stepAngle', `360° / ${stepAngle}° is not a whole number of steps per revolution.`);
};

const checkBacklash: Check = ({ backlash }) =>
  backlash === undefined || (isNumber(backlash) && backlash >= 0)
    ? null
    : fieldError('backlash', 'Backlash must be a number, 0 or more.');

const fieldChecks: readonly Check[] = [
  oneOf('units', 'Units', ['mm', 'in']),
  oneOf('start', 'The starting feature', ['pin', 'slot']),
  positive('width', 'Board width', { required: true }),
  positive('pin', 'Pin width', { required: true }),
  positive('slot', 'Slot width', { required: false }),
  positive('kerf', 'Kerf (cutter width)', { required: true }),
  positive('lead', 'Lead', { required: false }),
  positive('threadsPerInch', 'Threads per inch', { required: false }),
  notBoth('threadsPerInch', 'lead', 'Give either the lead or the threads per inch, not both.'),
  wholeInRange('stepsPerRev', 'Steps per revolution', [1, 100_000]),
  checkStepAngle,
  notBoth('stepAngle', 'stepsPerRev', 'Give either the step angle or the steps per revolution, not both.'),
  wholeInRange('microsteps', 'Microstepping', [1, 256]),
  checkBacklash,
  positive('rootDiameter', 'Root diameter', { required: false }),
  positive('screwLength', 'Length between bearings', { required: false }),
  needs('rootDiameter', 'screwLength', 'Give the length between bearings too, for the whirling speed.'),
  needs('screwLength', 'rootDiameter', 'Give the root diameter too, for the whirling speed.'),
  oneOf('fixity', 'End fixity', SCREW_FIXITIES),
  positive('maxStepRate', 'Maximum step rate', { required: false }),
];

/** Every problem of single fields and of fields that go together, in form order. */
export function checkJointFields(input: JointInput): JointFieldError[] {
  return fieldChecks.map((check) => check(input)).filter((error): error is JointFieldError => error !== null);
}

/** A length for a message, in the units the builder typed. */
export function formatLength(mm: number, units: JointUnits): string {
  return units === 'in' ? `${Number(mmToInches(mm).toPrecision(4))} in` : `${Number(mm.toPrecision(5))} mm`;
}

/** The board must hold its first feature whole and then some, so that each board gets a slot. */
export function checkWidthHoldsJoint(spec: JointSpec): JointFieldError[] {
  const first = spec.start === 'pin' ? spec.pin : spec.slot;
  return spec.width > first + LENGTH_TOLERANCE_MM
    ? []
    : [
        fieldError(
          'width',
          `The board must be wider than its first ${spec.start} (${formatLength(first, spec.units)}) so that both boards get a slot.`,
        ),
      ];
}

/** A limit on the feature count, checked before laying out so that a slip cannot allocate millions. */
export function checkFeatureCount(count: number): JointFieldError[] {
  // Every other feature is a slot of one board or the other, and each slot takes a pass.
  return count > 2 * MAX_PASSES
    ? [fieldError('width', `${count} pins and slots across the board need more than ${MAX_PASSES} passes.`)]
    : [];
}

function hasInteriorSlot(slots: FingerLayout['A']['slots'], width: number): boolean {
  return slots.some(([from, to]) => from > LENGTH_TOLERANCE_MM && to < width - LENGTH_TOLERANCE_MM);
}

/** The cutter must fit every slot with a pin on both sides; only an edge slot may be narrower. */
export function checkKerfFits(spec: JointSpec, layout: FingerLayout): JointFieldError[] {
  const boards = [
    { name: 'A', slots: layout.A.slots, slotWidth: spec.slot },
    { name: 'B', slots: layout.B.slots, slotWidth: spec.pin },
  ];
  return boards
    .filter(({ slots, slotWidth }) => spec.kerf > slotWidth + LENGTH_TOLERANCE_MM && hasInteriorSlot(slots, spec.width))
    .map(({ name, slotWidth }) =>
      fieldError(
        'kerf',
        `The cutter (${formatLength(spec.kerf, spec.units)}) is wider than board ${name}'s slots (${formatLength(slotWidth, spec.units)}).`,
      ),
    );
}

export function checkPassCount(spec: JointSpec, layout: FingerLayout): JointFieldError[] {
  const count = boardPassCount(layout.A, spec.kerf) + boardPassCount(layout.B, spec.kerf);
  return count > MAX_PASSES
    ? [
        fieldError(
          'kerf',
          `This joint needs ${count} passes, more than ${MAX_PASSES}; use a wider cutter or fewer fingers.`,
        ),
      ]
    : [];
}

/** Step counts must fit the controller's `long`. */
export function checkStepRange(largestStepCount: number): JointFieldError[] {
  return largestStepCount > MAX_STEP_COUNT
    ? [
        fieldError(
          'microsteps',
          `A move of ${largestStepCount} steps does not fit a 32-bit step count; use fewer microsteps.`,
        ),
      ]
    : [];
}
