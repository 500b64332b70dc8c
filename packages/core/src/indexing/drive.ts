import { MM_PER_INCH } from '../units/length';

export interface DriveRatio {
  /** Carriage travel per screw revolution, mm. */
  lead: number;
  /** Full steps per motor revolution. */
  stepsPerRev: number;
  /** Microsteps per full step set on the driver. */
  microsteps: number;
}

export interface IndexedPosition {
  /** Absolute step count from home. */
  steps: number;
  /** Where those steps put the carriage minus where it should be, mm. */
  roundingError: number;
}

/** The lead of a single-start screw with `threadsPerInch` threads per inch, mm. */
export function leadFromThreadsPerInch(threadsPerInch: number): number {
  return MM_PER_INCH / threadsPerInch;
}

/** Full steps per revolution of a motor with the given step angle in degrees (1.8° → 200). */
export function stepsPerRevFromStepAngle(stepAngle: number): number {
  return Math.round(360 / stepAngle);
}

export function stepsPerMm({ lead, stepsPerRev, microsteps }: DriveRatio): number {
  return (stepsPerRev * microsteps) / lead;
}

/**
 * Every position is rounded from home on its own, never as a sum of rounded moves, so the error
 * of one pass is at most half a step and does not carry into the next.
 */
export function indexPosition(position: number, stepsPerMillimetre: number): IndexedPosition {
  const steps = Math.round(position * stepsPerMillimetre);
  return { steps, roundingError: steps / stepsPerMillimetre - position };
}
