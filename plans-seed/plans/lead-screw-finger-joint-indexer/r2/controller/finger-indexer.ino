/*
 * Finger-joint indexer controller
 * Jigwright demo plan "lead-screw-finger-joint-indexer", revision r2, by Ilse Varga-Brandt.
 * Licence: CERN-OHL-P-2.0, like the rest of the plan.
 *
 * For a 5 V hobby microcontroller board of the common setup()/loop() kind, a step/direction
 * stepper driver and the switches in the plan's hardware list.
 *
 * What it does
 *   1. Waits for the NEXT button, then homes the carriage on the home limit switch.
 *   2. Reads the board selector (A or B) and steps the carriage to each position of that board's
 *      step table in finger_joint_steps.h, one position per press of NEXT. After each move the
 *      operator pushes the jig over the bit for one pass and brings it back.
 *   3. After the last pass it waits for NEXT and starts the selected board again from the top.
 *
 * finger_joint_steps.h is the C header exported by the plan page's indexing calculator (or by
 * `npx jigwright joint ... --header`). Its positions are absolute steps from the board's left
 * edge, in cutting order; JOINT_TAKE_UP_STEPS, when present, is the backlash take-up.
 *
 * The emergency stop does not depend on this program. Its first (normally closed) contact is
 * wired in the control circuit of the router's no-volt-release switch and in the driver's motor
 * supply, so pressing it removes power at once (stop category 0, IEC 60204-1 section 9.2.2). Its
 * second contact is read here, so that the program also stops issuing steps at once, disables the
 * driver and refuses to move again until the board is reset and the carriage homed again.
 * Mains wiring is work for a qualified person; follow local codes.
 */

#include "finger_joint_steps.h"

#ifndef JOINT_TAKE_UP_STEPS
#define JOINT_TAKE_UP_STEPS 0
#endif

// ---- Pins: change to suit your board -------------------------------------------------------
// Every switch is wired between its pin and ground and read with the internal pull-up.
// Normally closed contacts (e-stop, limits) read LOW in normal use and HIGH when they open,
// so a broken wire looks like a pressed switch and stops the jig.
const uint8_t PIN_STEP = 2;     // driver STEP input
const uint8_t PIN_ESTOP = 3;    // e-stop second contact, normally closed; an interrupt pin
const uint8_t PIN_DIR = 5;      // driver DIR input: HIGH moves away from home
const uint8_t PIN_ENABLE = 8;   // driver ENABLE input, active LOW on most drivers
const uint8_t PIN_HOME = 9;     // home limit switch, normally closed
const uint8_t PIN_FAR = 10;     // far-end limit switch, normally closed
const uint8_t PIN_NEXT = 11;    // NEXT push button, normally open
const uint8_t PIN_BOARD_B = 12; // selector, LOW selects board B
const uint8_t PIN_LED = 13;     // lit while the carriage may move

// ---- Calibration: see "Calibrating" in the build notes ---------------------------------------
// 400 steps per mm: 200 steps/rev x 16 microsteps / 8 mm lead.
const long EDGE_OFFSET_STEPS = 4000;  // from the home switch to the board's left edge (10 mm)
const long MAX_TRAVEL_STEPS = 84000;  // soft limit from the home switch (210 mm)
const long HOME_BACK_OFF_STEPS = 800; // move off the switch after it trips (2 mm)

// ---- Speeds ----------------------------------------------------------------------------------
const unsigned int STEP_PULSE_US = 5;            // longer than the driver's minimum pulse
const unsigned int START_INTERVAL_US = 600;      // first step of every move
const unsigned int CRUISE_INTERVAL_US = 125;     // 8,000 steps/s = 20 mm/s
const unsigned int HOME_INTERVAL_US = 500;       // while looking for the home switch
const unsigned long DEBOUNCE_MS = 30;

volatile bool estopTripped = false;
bool homed = false;
long position = 0;  // steps from the board's left edge; meaningful only once homed

// Runs the moment the e-stop contact opens: nothing else has to notice first.
void onEstop() {
  estopTripped = true;
  digitalWrite(PIN_ENABLE, HIGH);  // driver off: the motor no longer holds or moves
}

bool switchOpen(uint8_t pin) { return digitalRead(pin) == HIGH; }

// Stops for good after an e-stop or a limit fault: blinks the LED until the board is reset.
// Reset does not move anything; the operator must press NEXT to home again.
void halt(const char *why) {
  digitalWrite(PIN_ENABLE, HIGH);
  homed = false;
  Serial.print(F("STOPPED: "));
  Serial.println(why);
  Serial.println(F("Release the e-stop, clear the fault, then press reset."));
  for (;;) {
    digitalWrite(PIN_LED, (millis() / 250) % 2);
  }
}

void checkStop() {
  if (estopTripped || switchOpen(PIN_ESTOP)) halt("emergency stop");
}

// One step in `direction` (+1 away from home, -1 towards it), checked before every pulse.
void stepOnce(int direction, unsigned int intervalUs, bool seekingHome) {
  checkStop();
  if (direction > 0 && switchOpen(PIN_FAR)) halt("far limit switch");
  if (direction > 0 && homed && position + EDGE_OFFSET_STEPS >= MAX_TRAVEL_STEPS) halt("soft travel limit");
  if (direction < 0 && !seekingHome && switchOpen(PIN_HOME)) halt("home switch hit during a move");
  digitalWrite(PIN_DIR, direction > 0 ? HIGH : LOW);
  digitalWrite(PIN_STEP, HIGH);
  delayMicroseconds(STEP_PULSE_US);
  digitalWrite(PIN_STEP, LOW);
  delayMicroseconds(intervalUs);
  position += direction;
}

// Moves `steps` steps with a short speed ramp at each end so the motor does not stall.
void moveBy(long steps) {
  const int direction = steps > 0 ? 1 : -1;
  const long count = steps > 0 ? steps : -steps;
  unsigned int interval = START_INTERVAL_US;
  for (long i = 0; i < count; i++) {
    const long left = count - i;
    if (left < 200 && interval < START_INTERVAL_US) interval += 3;        // slowing down
    else if (left >= 200 && interval > CRUISE_INTERVAL_US) interval -= 3; // speeding up
    stepOnce(direction, interval, false);
  }
}

// Every position is approached moving away from home, so the nut's backlash is always taken up
// on the same flank: going back means going below the target first.
void moveTo(long target) {
  if (target < position) moveBy(target - JOINT_TAKE_UP_STEPS - position);
  if (target > position) moveBy(target - position);
}

void home() {
  Serial.println(F("Homing..."));
  digitalWrite(PIN_ENABLE, LOW);
  long guard = MAX_TRAVEL_STEPS + EDGE_OFFSET_STEPS;
  while (!switchOpen(PIN_HOME)) {
    stepOnce(-1, HOME_INTERVAL_US, true);
    if (--guard <= 0) halt("home switch not found");
  }
  for (long i = 0; i < HOME_BACK_OFF_STEPS; i++) stepOnce(1, HOME_INTERVAL_US, true);
  if (switchOpen(PIN_HOME)) halt("home switch did not release");
  // The switch point is EDGE_OFFSET_STEPS below the board's edge; count from the edge.
  position = HOME_BACK_OFF_STEPS - EDGE_OFFSET_STEPS;
  homed = true;
  Serial.println(F("Homed."));
}

// Waits for one press and release of NEXT; the e-stop is watched all the while.
void waitForNext() {
  digitalWrite(PIN_LED, LOW);
  while (digitalRead(PIN_NEXT) == HIGH) checkStop();
  delay(DEBOUNCE_MS);
  while (digitalRead(PIN_NEXT) == LOW) checkStop();
  delay(DEBOUNCE_MS);
  digitalWrite(PIN_LED, HIGH);
}

void cutBoard(const long *steps, int passes, char name) {
  Serial.print(F("Board "));
  Serial.print(name);
  Serial.print(F(": "));
  Serial.print(passes);
  Serial.println(F(" passes. Press NEXT for each position."));
  for (int i = 0; i < passes; i++) {
    waitForNext();
    moveTo(steps[i]);
    Serial.print(F("Pass "));
    Serial.print(i + 1);
    Serial.print(F(" of "));
    Serial.print(passes);
    Serial.print(F(" at "));
    Serial.print(position / 400.0, 3);
    Serial.println(F(" mm: cut now."));
  }
  Serial.println(F("Board done. Press NEXT to start again."));
}

void setup() {
  pinMode(PIN_STEP, OUTPUT);
  pinMode(PIN_DIR, OUTPUT);
  pinMode(PIN_ENABLE, OUTPUT);
  digitalWrite(PIN_ENABLE, HIGH);  // driver off until the operator asks for a move
  pinMode(PIN_LED, OUTPUT);
  pinMode(PIN_ESTOP, INPUT_PULLUP);
  pinMode(PIN_HOME, INPUT_PULLUP);
  pinMode(PIN_FAR, INPUT_PULLUP);
  pinMode(PIN_NEXT, INPUT_PULLUP);
  pinMode(PIN_BOARD_B, INPUT_PULLUP);
  attachInterrupt(digitalPinToInterrupt(PIN_ESTOP), onEstop, RISING);
  Serial.begin(115200);
  checkStop();
  // Never move on power-up: the operator starts homing.
  Serial.println(F("Finger-joint indexer. Press NEXT to home."));
  waitForNext();
  home();
}

void loop() {
  if (digitalRead(PIN_BOARD_B) == LOW) cutBoard(joint_board_b_steps, JOINT_BOARD_B_PASSES, 'B');
  else cutBoard(joint_board_a_steps, JOINT_BOARD_A_PASSES, 'A');
  waitForNext();
}
