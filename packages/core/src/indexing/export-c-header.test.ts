import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { jointCHeader } from './export-c-header';
import { planJoint, type JointPlan } from './plan-joint';

function planOf(outcome: ReturnType<typeof planJoint>): JointPlan {
  if (!outcome.ok) throw new Error(JSON.stringify(outcome.errors));
  return outcome.plan;
}

function headerOf(plan: JointPlan): string {
  const outcome = jointCHeader(plan);
  if (!outcome.ok) throw new Error(JSON.stringify(outcome.errors));
  return outcome.text;
}

const hasCompiler = spawnSync('cc', ['--version']).status === 0;

const program = `#include <stdio.h>
#include "joint.h"
#include "joint.h"
int main(void) {
  for (int i = 0; i < JOINT_BOARD_A_PASSES; i++) printf("A %ld\\n", joint_board_a_steps[i]);
  for (int i = 0; i < JOINT_BOARD_B_PASSES; i++) printf("B %ld\\n", joint_board_b_steps[i]);
  return 0;
}
`;

describe('jointCHeader', () => {
  const plan = planOf(planJoint({ width: 120, pin: 12, slot: 9, kerf: 3.2, lead: 8, microsteps: 16, backlash: 0.08 }));

  it('gives steps per mm as a comment and a const long array with its length per board', () => {
    const text = headerOf(plan);
    expect(text).toContain('400 steps per mm');
    expect(text).toContain(`#define JOINT_BOARD_A_PASSES ${plan.boards.A.passes.length}`);
    expect(text).toContain('static const long joint_board_b_steps[JOINT_BOARD_B_PASSES] = {');
    expect(text).toContain('#define JOINT_TAKE_UP_STEPS 32');
    expect(text).toContain('Caution: powered saw or router');
  });

  it('needs a drive', () => {
    const outcome = jointCHeader(planOf(planJoint({ width: 50, pin: 10, kerf: 5 })));
    expect(outcome.ok ? [] : outcome.errors.map((error) => error.field)).toEqual(['lead']);
  });

  // An outside check: a C compiler reads the header (included twice) and prints the tables back.
  it.skipIf(!hasCompiler)('compiles without warnings and holds every step count in cutting order', () => {
    const folder = mkdtempSync(join(tmpdir(), 'jigwright-header-'));
    try {
      writeFileSync(join(folder, 'joint.h'), headerOf(plan));
      writeFileSync(join(folder, 'main.c'), program);
      execFileSync('cc', [
        '-std=c99',
        '-Wall',
        '-Wextra',
        '-Werror',
        '-o',
        join(folder, 'joint'),
        join(folder, 'main.c'),
      ]);
      const printed = execFileSync(join(folder, 'joint'), { encoding: 'utf8' }).trim().split('\n');
      const expected = [
        ...plan.boards.A.passes.map((pass) => `A ${pass.steps}`),
        ...plan.boards.B.passes.map((pass) => `B ${pass.steps}`),
      ];
      expect(printed).toEqual(expected);
    } finally {
      rmSync(folder, { recursive: true, force: true });
    }
  });
});
