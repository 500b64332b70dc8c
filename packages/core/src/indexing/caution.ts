export interface Caution {
  heading: string;
  points: readonly string[];
  /** Where the points come from; they never replace local codes. */
  sources: readonly string[];
}

/**
 * The cautions shown beside every indexing result and written at the top of every export. Kept
 * short per point so that an export can write each one as a comment line a controller accepts.
 */
export const POWERED_CUTTER_CAUTION: Caution = {
  heading: 'Caution: powered saw or router',
  points: [
    'Keep the guard on the blade or bit as the tool maker intends.',
    'Clamp the workpiece to the carriage; never hold it by hand during a cut.',
    'Keep hands clear of the cutter; wait until it has stopped before reaching in.',
    'Keep an emergency stop within reach that removes power to the cutter and the motor.',
    'The saw and the jig must not restart by themselves after a power failure.',
    'Dry-run every program with the cutter off before the first cut.',
    "Local codes and the tool maker's instructions come first; these notes do not replace them.",
  ],
  sources: [
    'OSHA 29 CFR 1910.213 (woodworking machinery): guarding, power control within reach, no automatic restart',
    'IEC 60204-1 §9.2.2: stop categories; an emergency stop is category 0 or 1',
  ],
};
