import { inchesToMm } from '../units/length';
import { leadFromThreadsPerInch, stepsPerRevFromStepAngle, type DriveRatio } from './drive';
import type { EdgeFeature } from './finger-layout';
import type { ScrewFixity, ScrewGeometry } from './whirling';

export type JointUnits = 'mm' | 'in';

/**
 * What a builder types into the calculator, one flat field per form input (so that a page can
 * map errors to inputs and inputs to a query string). Lengths are in `units`; the lead is in mm
 * per revolution or given as threads per inch.
 */
export interface JointInput {
  /** Units of every length below except the lead; default mm. */
  units?: JointUnits;
  width: number;
  pin: number;
  /** Default: the pin width. */
  slot?: number;
  /** Blade kerf or dado/bit width. */
  kerf: number;
  /** Board A's left-edge feature; default pin. */
  start?: EdgeFeature;
  /** Screw lead, mm per revolution; without it (or threadsPerInch) no steps are computed. */
  lead?: number;
  /** Threads per inch of a single-start screw, instead of lead. */
  threadsPerInch?: number;
  /** Full steps per motor revolution; default 200. */
  stepsPerRev?: number;
  /** Motor step angle in degrees, instead of stepsPerRev. */
  stepAngle?: number;
  /** Driver microstepping, 1 to 256; default 1. */
  microsteps?: number;
  backlash?: number;
  /** Screw root diameter; with screwLength, gives the whirling speed. */
  rootDiameter?: number;
  /** Screw length between bearings. */
  screwLength?: number;
  /** How the screw ends are held; default pinned-pinned. */
  fixity?: ScrewFixity;
  /** Highest step rate of the controller, steps per second. */
  maxStepRate?: number;
}

export type JointField = keyof JointInput;

export interface JointFieldError {
  field: JointField;
  message: string;
}

export interface DriveSpec extends DriveRatio {
  /** mm. */
  backlash: number;
  screw: ScrewGeometry | null;
  maxStepRate: number | null;
}

/** A checked input with every default applied and every length in mm. */
export interface JointSpec {
  units: JointUnits;
  width: number;
  pin: number;
  slot: number;
  kerf: number;
  start: EdgeFeature;
  drive: DriveSpec | null;
}

export const DEFAULT_STEPS_PER_REV = 200;

/** Converts a length given in `units` to mm. */
export function lengthToMm(value: number, units: JointUnits): number {
  return units === 'in' ? inchesToMm(value) : value;
}

function toDriveSpec(input: JointInput, units: JointUnits): DriveSpec | null {
  const lead =
    input.lead ?? (input.threadsPerInch === undefined ? undefined : leadFromThreadsPerInch(input.threadsPerInch));
  if (lead === undefined) return null;
  const screw =
    input.rootDiameter === undefined || input.screwLength === undefined
      ? null
      : {
          rootDiameter: lengthToMm(input.rootDiameter, units),
          length: lengthToMm(input.screwLength, units),
          fixity: input.fixity ?? 'pinned-pinned',
        };
  return {
    lead,
    stepsPerRev:
      input.stepsPerRev ??
      (input.stepAngle === undefined ? DEFAULT_STEPS_PER_REV : stepsPerRevFromStepAngle(input.stepAngle)),
    microsteps: input.microsteps ?? 1,
    backlash: lengthToMm(input.backlash ?? 0, units),
    screw,
    maxStepRate: input.maxStepRate ?? null,
  };
}

/** Applies the defaults and converts to mm; the input must have passed `checkJointFields`. */
export function toJointSpec(input: JointInput): JointSpec {
  const units = input.units ?? 'mm';
  return {
    units,
    width: lengthToMm(input.width, units),
    pin: lengthToMm(input.pin, units),
    slot: lengthToMm(input.slot ?? input.pin, units),
    kerf: lengthToMm(input.kerf, units),
    start: input.start ?? 'pin',
    drive: toDriveSpec(input, units),
  };
}
