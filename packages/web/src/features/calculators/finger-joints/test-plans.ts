import { planJoint, type JointInput, type JointPlan } from '@jigwright/core';

/** The plan of an input the test knows to be good; a test helper, never imported by the page. */
export function planOf(input: JointInput): JointPlan {
  const outcome = planJoint(input);
  if (!outcome.ok) throw new Error(`expected a plan, got ${JSON.stringify(outcome.errors)}`);
  return outcome.plan;
}
