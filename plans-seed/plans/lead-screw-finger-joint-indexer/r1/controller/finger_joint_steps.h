/*
 * Jigwright finger joint: absolute step positions, 26 passes.
 * Width 156 mm, pin 12 mm, slot 12 mm, kerf 6 mm; board A starts with a
 * pin, board B with a slot.
 * Positions: the left face of the cutter, from home at the left edge of
 * the board.
 * Lead 8 mm, 200 steps/rev, 16 microsteps: 400 steps per mm, 0.0025 mm
 * per step.
 * Approach every pass moving away from home: before the first pass of a
 * board, move below it by at least the backlash, then up to it; the
 * later passes lie further up.
 * Top carriage speed 1200 mm/min.
 * Caution: powered saw or router.
 * - Keep the guard on the blade or bit as the tool maker intends.
 * - Clamp the workpiece to the carriage; never hold it by hand during a
 * cut.
 * - Keep hands clear of the cutter; wait until it has stopped before
 * reaching in.
 * - Keep an emergency stop within reach that removes power to the cutter
 * and the motor.
 * - The saw and the jig must not restart by themselves after a power
 * failure.
 * - Dry-run every program with the cutter off before the first cut.
 * - Local codes and the tool maker's instructions come first; these
 * notes do not replace them.
 * Sources: OSHA 29 CFR 1910.213 (woodworking machinery): guarding, power
 * control within reach, no automatic restart; IEC 60204-1 clause 9.2.2:
 * stop categories; an emergency stop is category 0 or 1.
 */
#ifndef JIGWRIGHT_FINGER_JOINT_H
#define JIGWRIGHT_FINGER_JOINT_H

#define JOINT_TAKE_UP_STEPS 20

#define JOINT_BOARD_A_PASSES 12
static const long joint_board_a_steps[JOINT_BOARD_A_PASSES] = {
  4800, 7200, 14400, 16800, 24000, 26400, 33600, 36000,
  43200, 45600, 52800, 55200,
};

#define JOINT_BOARD_B_PASSES 14
static const long joint_board_b_steps[JOINT_BOARD_B_PASSES] = {
  0, 2400, 9600, 12000, 19200, 21600, 28800, 31200,
  38400, 40800, 48000, 50400, 57600, 60000,
};

#endif
