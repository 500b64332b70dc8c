import {
  MM_PER_INCH,
  SCREW_FIXITIES,
  type EdgeFeature,
  type JointField,
  type JointInput,
  type JointUnits,
  type ScrewFixity,
  type SymmetrySuggestion,
  parseInchFraction,
} from '@jigwright/core';

/** Lengths typed in the form's units. */
const LENGTH_FIELDS = [
  'width',
  'pin',
  'slot',
  'kerf',
  'backlash',
  'rootDiameter',
  'screwLength',
] as const satisfies readonly JointField[];

/** Numbers that do not change with the units. */
const PLAIN_FIELDS = [
  'lead',
  'threadsPerInch',
  'stepsPerRev',
  'stepAngle',
  'microsteps',
  'maxStepRate',
] as const satisfies readonly JointField[];

type LengthField = (typeof LENGTH_FIELDS)[number];
type PlainField = (typeof PLAIN_FIELDS)[number];
export type TextField = LengthField | PlainField;

export type LeadAs = 'lead' | 'threadsPerInch';
export type MotorAs = 'stepsPerRev' | 'stepAngle';

/**
 * What the form holds: the text of every box as typed (so that "12." or "3/" survive a keystroke)
 * and the choices. Both boxes of a choice keep their text; only the chosen one counts.
 */
export interface JointFormState {
  units: JointUnits;
  start: EdgeFeature;
  leadAs: LeadAs;
  motorAs: MotorAs;
  fixity: ScrewFixity;
  text: Record<TextField, string>;
  /**
   * Lengths the page wrote into a box (after a units switch or a suggestion) with more digits than
   * the box shows; each holds while its box still shows `text`. Without them 156 mm = 6.1417 in and
   * 12 mm = 0.4724 in would leave a sliver of a fourteenth feature at the board's edge.
   */
  exact: Partial<Record<LengthField, { text: string; value: number }>>;
}

const EMPTY_TEXT: Record<TextField, string> = {
  width: '',
  pin: '',
  slot: '',
  kerf: '',
  backlash: '',
  rootDiameter: '',
  screwLength: '',
  lead: '',
  threadsPerInch: '',
  stepsPerRev: '',
  stepAngle: '',
  microsteps: '',
  maxStepRate: '',
};

/**
 * A drawer-side joint (seven pins, six slots) cut with a full-kerf blade on a T8 lead screw (8 mm lead) and a
 * 1.8° motor at 16 microsteps: a common hobby drive, with every figure of the page filled in.
 */
export const DEFAULT_FORM: JointFormState = {
  units: 'mm',
  start: 'pin',
  leadAs: 'lead',
  motorAs: 'stepsPerRev',
  fixity: 'fixed-pinned',
  exact: {},
  text: {
    ...EMPTY_TEXT,
    width: '156',
    pin: '12',
    kerf: '3.2',
    backlash: '0.05',
    rootDiameter: '6.2',
    screwLength: '400',
    lead: '8',
    threadsPerInch: '10',
    stepsPerRev: '200',
    stepAngle: '1.8',
    microsteps: '16',
    maxStepRate: '20000',
  },
};

/** The boxes that count with the current choices, in form order. */
export function activeFields(state: Pick<JointFormState, 'leadAs' | 'motorAs'>): TextField[] {
  return [
    'width',
    'pin',
    'slot',
    'kerf',
    state.leadAs,
    state.motorAs,
    'microsteps',
    'backlash',
    'rootDiameter',
    'screwLength',
    'maxStepRate',
  ];
}

const isLengthField = (field: TextField): field is LengthField => (LENGTH_FIELDS as readonly string[]).includes(field);

/**
 * A box's text as a number: empty is "not given", anything unreadable is NaN so that the core
 * names the field. Inch lengths may be written as fractions (3/4, 1-1/2).
 */
export function readNumber(text: string, { fraction }: { fraction: boolean }): number | undefined {
  const trimmed = text.trim().replace(',', '.');
  if (trimmed === '') return undefined;
  if (fraction && trimmed.includes('/')) {
    const mm = parseInchFraction(trimmed);
    return mm === undefined ? Number.NaN : mm / MM_PER_INCH;
  }
  return Number(trimmed);
}

/** The number a box stands for: the exact length behind it, or its text. */
function fieldValue(state: JointFormState, field: TextField): number | undefined {
  const exact = isLengthField(field) ? state.exact[field] : undefined;
  if (exact !== undefined && exact.text === state.text[field]) return exact.value;
  return readNumber(state.text[field], { fraction: state.units === 'in' && isLengthField(field) });
}

/** The core's input for the form as it stands. */
export function toJointInput(state: JointFormState): JointInput {
  const input: Partial<Record<TextField, number>> = {};
  for (const field of activeFields(state)) {
    const value = fieldValue(state, field);
    if (value !== undefined) input[field] = value;
  }
  const hasScrew = input.rootDiameter !== undefined || input.screwLength !== undefined;
  return {
    ...input,
    // Required by the type; an empty box becomes NaN so that the core reports it as not a number.
    width: input.width ?? Number.NaN,
    pin: input.pin ?? Number.NaN,
    kerf: input.kerf ?? Number.NaN,
    units: state.units,
    start: state.start,
    ...(hasScrew ? { fixity: state.fixity } : {}),
  };
}

/** Short enough to read, fine enough to keep the joint: 0.0001 in is 2.5 µm, 0.01 mm is 0.4 thou. */
const DECIMALS: Record<JointUnits, number> = { in: 4, mm: 2 };

/** `value` written into a length box: shown rounded, kept exact behind the box when rounding changed it. */
function withLength(state: JointFormState, field: LengthField, value: number): JointFormState {
  const text = String(Number(value.toFixed(DECIMALS[state.units])));
  const { [field]: _previous, ...exact } = state.exact;
  const rounded = Math.abs(Number(text) - value) <= 1e-12 * Math.max(1, Math.abs(value));
  return {
    ...state,
    text: { ...state.text, [field]: text },
    exact: rounded ? exact : { ...exact, [field]: { text, value } },
  };
}

/** The same lengths in the other units; a box that holds no number is left as typed. */
export function convertUnits(state: JointFormState, units: JointUnits): JointFormState {
  if (units === state.units) return state;
  return LENGTH_FIELDS.reduce<JointFormState>(
    (next, field) => {
      const value = fieldValue(state, field);
      if (value === undefined || !Number.isFinite(value)) return next;
      return withLength(next, field, units === 'in' ? value / MM_PER_INCH : value * MM_PER_INCH);
    },
    { ...state, units, exact: {} },
  );
}

/** A symmetry suggestion (in mm) taken into the form. */
export function applySuggestion(state: JointFormState, suggestion: SymmetrySuggestion): JointFormState {
  const mm = suggestion.change === 'width' ? suggestion.width : suggestion.pin;
  return withLength(state, suggestion.change, state.units === 'in' ? mm / MM_PER_INCH : mm);
}

const oneOf = <T extends string>(value: string | null, allowed: readonly T[], fallback: T): T =>
  allowed.find((option) => option === value) ?? fallback;

/**
 * The form from a query string. No parameters at all means the defaults; otherwise only what the
 * link holds, so that a link without a lead reproduces a layout without a drive.
 */
export function formFromQuery(params: URLSearchParams): JointFormState {
  if ([...params.keys()].length === 0) return DEFAULT_FORM;
  const text = { ...EMPTY_TEXT };
  for (const field of [...LENGTH_FIELDS, ...PLAIN_FIELDS]) text[field] = params.get(field) ?? '';
  return {
    units: oneOf(params.get('units'), ['mm', 'in'], 'mm'),
    start: oneOf(params.get('start'), ['pin', 'slot'], 'pin'),
    leadAs: params.has('threadsPerInch') && !params.has('lead') ? 'threadsPerInch' : 'lead',
    motorAs: params.has('stepAngle') && !params.has('stepsPerRev') ? 'stepAngle' : 'stepsPerRev',
    fixity: oneOf(params.get('fixity'), SCREW_FIXITIES, DEFAULT_FORM.fixity),
    text,
    exact: {},
  };
}

/**
 * The query string that reproduces the form: the choices and every box that counts and is filled,
 * with the exact length behind a box where there is one, so that the link gives the same joint.
 */
export function formToQuery(state: JointFormState): URLSearchParams {
  const params = new URLSearchParams({ units: state.units, start: state.start });
  for (const field of activeFields(state)) {
    const exact = isLengthField(field) ? state.exact[field] : undefined;
    const value =
      exact !== undefined && exact.text === state.text[field] ? String(exact.value) : state.text[field].trim();
    if (value !== '') params.set(field, value);
  }
  if (params.has('rootDiameter') || params.has('screwLength')) params.set('fixity', state.fixity);
  return params;
}

/**
 * The calculator's address for a saved set of inputs (as a plan's revision keeps them), so that
 * "Open in the calculator" shows the same joint with every number as it was saved.
 */
export function jointInputQuery(input: JointInput): URLSearchParams {
  const params = new URLSearchParams({ units: input.units ?? 'mm', start: input.start ?? 'pin' });
  for (const field of [...LENGTH_FIELDS, ...PLAIN_FIELDS]) {
    const value = input[field];
    if (typeof value === 'number' && Number.isFinite(value)) params.set(field, String(value));
  }
  if (input.fixity && (params.has('rootDiameter') || params.has('screwLength'))) params.set('fixity', input.fixity);
  return params;
}
