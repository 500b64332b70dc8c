import { indexPosition, stepsPerMm, type DriveRatio } from './drive';
import {
  approachRule,
  carriageSpeedAt,
  carriageTravel,
  stepRateTopSpeed,
  type ApproachRule,
  type CarriageTravel,
} from './carriage';
import { featureCount, layoutFingers, LENGTH_TOLERANCE_MM, type BoardLayout, type FingerLayout } from './finger-layout';
import { toJointSpec, type DriveSpec, type JointFieldError, type JointInput, type JointSpec } from './joint-input';
import { boardPasses, type Pass } from './passes';
import { suggestSymmetricLayouts, type SymmetrySuggestion } from './symmetry';
import {
  checkFeatureCount,
  checkJointFields,
  checkKerfFits,
  checkPassCount,
  checkStepRange,
  checkWidthHoldsJoint,
  formatLength,
} from './validation';
import { WHIRLING_SAFE_FRACTION, whirlingSpeedRpm, type ScrewGeometry } from './whirling';

export type BoardName = 'A' | 'B';

export interface IndexedPass extends Pass {
  /** Absolute steps from home; null without a drive. */
  steps: number | null;
  /** mm; null without a drive. */
  roundingError: number | null;
}

export interface BoardPlan extends BoardLayout {
  passes: IndexedPass[];
}

export interface WhirlingFigures extends ScrewGeometry {
  criticalRpm: number;
  /** WHIRLING_SAFE_FRACTION of the critical speed. */
  safeRpm: number;
  /** Carriage speed at the safe screw speed, mm/min. */
  topSpeed: number;
}

export interface DriveFigures extends DriveRatio {
  backlash: number;
  approach: ApproachRule | null;
  travel: CarriageTravel;
  whirling: WhirlingFigures | null;
  /** Carriage speed at the controller's maximum step rate, mm/min. */
  stepRateTopSpeed: number | null;
  /** The lower of the two limits, mm/min; null when neither is known. */
  topSpeed: number | null;
}

export interface JointWarning {
  code: 'partial-edge';
  message: string;
}

/** Everything the calculator shows; plain data, lengths in mm, speeds in mm/min. */
export interface JointPlan extends Omit<JointSpec, 'drive'> {
  boards: Record<BoardName, BoardPlan>;
  passCount: number;
  stepsPerMm: number | null;
  /** mm per step. */
  resolution: number | null;
  /** The largest |rounding error| of any pass, mm. */
  maxRoundingError: number | null;
  drive: DriveFigures | null;
  symmetry: SymmetrySuggestion[];
  warnings: JointWarning[];
}

export type JointOutcome = { ok: true; plan: JointPlan } | { ok: false; errors: JointFieldError[] };

function indexPasses(passes: Pass[], rate: number | null): IndexedPass[] {
  return passes.map((pass) =>
    rate === null ? { ...pass, steps: null, roundingError: null } : { ...pass, ...indexPosition(pass.position, rate) },
  );
}

function whirlingFigures(screw: ScrewGeometry, lead: number): WhirlingFigures {
  const criticalRpm = whirlingSpeedRpm(screw);
  const safeRpm = criticalRpm * WHIRLING_SAFE_FRACTION;
  return { ...screw, criticalRpm, safeRpm, topSpeed: carriageSpeedAt(safeRpm, lead) };
}

function driveFigures(drive: DriveSpec, rate: number, positions: number[]): DriveFigures {
  const approach = drive.backlash > 0 ? approachRule(drive.backlash, rate) : null;
  const whirling = drive.screw === null ? null : whirlingFigures(drive.screw, drive.lead);
  const byStepRate = drive.maxStepRate === null ? null : stepRateTopSpeed(drive.maxStepRate, rate);
  const limits = [whirling?.topSpeed, byStepRate].filter((limit): limit is number => limit != null);
  return {
    lead: drive.lead,
    stepsPerRev: drive.stepsPerRev,
    microsteps: drive.microsteps,
    backlash: drive.backlash,
    approach,
    travel: carriageTravel(positions, { takeUp: approach?.takeUp ?? 0 }),
    whirling,
    stepRateTopSpeed: byStepRate,
    topSpeed: limits.length === 0 ? null : Math.min(...limits),
  };
}

/** The right-edge feature is cut short unless the width happens to hold whole features. */
function partialEdgeWarnings(spec: JointSpec, layout: FingerLayout): JointWarning[] {
  const lastPin = layout.A.pins.at(-1);
  const lastSlot = layout.A.slots.at(-1);
  if (lastPin === undefined || lastSlot === undefined) return [];
  const [kind, [from, to], full] =
    lastPin[1] > lastSlot[1] ? (['pin', lastPin, spec.pin] as const) : (['slot', lastSlot, spec.slot] as const);
  const other = kind === 'pin' ? 'slot' : 'pin';
  return to - from < full - LENGTH_TOLERANCE_MM
    ? [
        {
          code: 'partial-edge',
          message: `At the right edge, board A's ${kind} and board B's ${other} are ${formatLength(to - from, spec.units)} wide instead of ${formatLength(full, spec.units)}; see the symmetric widths.`,
        },
      ]
    : [];
}

function planChecked(spec: JointSpec, input: JointInput): JointOutcome {
  const layoutInput = { width: spec.width, pin: spec.pin, slot: spec.slot, start: spec.start };
  const countErrors = checkFeatureCount(featureCount(layoutInput));
  if (countErrors.length > 0) return { ok: false, errors: countErrors };
  const layout = layoutFingers(layoutInput);
  const layoutErrors = [...checkKerfFits(spec, layout), ...checkPassCount(spec, layout)];
  if (layoutErrors.length > 0) return { ok: false, errors: layoutErrors };

  const rate = spec.drive === null ? null : stepsPerMm(spec.drive);
  const boards = {
    A: { ...layout.A, passes: indexPasses(boardPasses(layout.A, spec.kerf, spec), rate) },
    B: { ...layout.B, passes: indexPasses(boardPasses(layout.B, spec.kerf, spec), rate) },
  };
  const passes = [...boards.A.passes, ...boards.B.passes];
  const stepErrors = checkStepRange(Math.max(...passes.map((pass) => Math.abs(pass.steps ?? 0))));
  if (stepErrors.length > 0) return { ok: false, errors: stepErrors };

  const errors = passes.map((pass) => Math.abs(pass.roundingError ?? 0));
  const { drive, ...dimensions } = spec;
  return {
    ok: true,
    plan: {
      ...dimensions,
      boards,
      passCount: passes.length,
      stepsPerMm: rate,
      resolution: rate === null ? null : 1 / rate,
      maxRoundingError: rate === null ? null : Math.max(...errors),
      drive:
        drive === null || rate === null
          ? null
          : driveFigures(
              drive,
              rate,
              passes.map((pass) => pass.position),
            ),
      symmetry: suggestSymmetricLayouts(spec, { slotFollowsPin: input.slot === undefined }),
      warnings: partialEdgeWarnings(spec, layout),
    },
  };
}

/**
 * The whole calculator: finger layout of both boards, passes, steps and drive figures. Pure and
 * total: bad input comes back as per-field errors, never as an exception.
 */
export function planJoint(input: JointInput): JointOutcome {
  const fieldErrors = checkJointFields(input);
  if (fieldErrors.length > 0) return { ok: false, errors: fieldErrors };
  const spec = toJointSpec(input);
  const widthErrors = checkWidthHoldsJoint(spec);
  if (widthErrors.length > 0) return { ok: false, errors: widthErrors };
  return planChecked(spec, input);
}
