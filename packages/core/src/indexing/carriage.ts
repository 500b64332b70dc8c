export interface CarriageTravel {
  /** Lowest cutter position the carriage reaches, mm (home is 0, the board's left edge). */
  from: number;
  /** Highest cutter position, mm. */
  to: number;
  length: number;
}

export interface ApproachRule {
  direction: 'positive';
  /** Distance to back off below a target before moving up to it, mm. */
  takeUp: number;
  takeUpSteps: number;
  rule: string;
}

export interface TravelOptions {
  /** Take-up distance before the first pass, mm (0 without backlash). */
  takeUp: number;
}

/** The span the carriage must move through: from home or the first take-up to the last pass. */
export function carriageTravel(positions: readonly number[], { takeUp }: TravelOptions): CarriageTravel {
  const from = Math.min(0, ...positions.map((position) => position - takeUp));
  const to = Math.max(0, ...positions);
  return { from, to, length: to - from };
}

/**
 * With backlash in the drive, a target reached while moving up sits at a different place than the
 * same target reached while moving down, so every pass is approached moving up. Passes are cut in
 * ascending order, so only the first move of a board needs the take-up.
 */
export function approachRule(backlash: number, stepsPerMillimetre: number): ApproachRule {
  const takeUpSteps = Math.ceil(backlash * stepsPerMillimetre);
  return {
    direction: 'positive',
    takeUp: takeUpSteps / stepsPerMillimetre,
    takeUpSteps,
    rule:
      'Approach every pass moving away from home: before the first pass of a board, move below it ' +
      'by at least the backlash, then up to it; the later passes lie further up.',
  };
}

/** The fastest carriage speed the controller's step rate allows, mm/min. */
export function stepRateTopSpeed(maxStepRate: number, stepsPerMillimetre: number): number {
  return (maxStepRate / stepsPerMillimetre) * 60;
}

/** The carriage speed at which the screw turns at `rpm`, mm/min. */
export function carriageSpeedAt(rpm: number, lead: number): number {
  return rpm * lead;
}
