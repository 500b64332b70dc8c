import { describe, expect, it } from 'vitest';
import { rebaseForm, type PlanDetailsForm } from './plan-details';

const base: PlanDetailsForm = {
  title: 'Bench hook',
  summary: 'For crosscuts.',
  category: 'other',
  tags: 'hand tools',
  toolsNeeded: ['hand-saw'],
  licence: 'CC-BY-4.0',
  motorised: false,
};

describe('rebaseForm', () => {
  it('keeps what the member changed and takes everything else from the newer copy', () => {
    const typed = { ...base, title: 'Bench hook with a fence', toolsNeeded: ['hand-saw', 'hand-plane'] };
    const newer = { ...base, summary: 'Changed in another tab.', tags: 'hand tools, bench', title: 'Other title' };
    expect(rebaseForm(typed, base, newer)).toEqual({
      ...newer,
      title: 'Bench hook with a fence',
      toolsNeeded: ['hand-saw', 'hand-plane'],
    });
  });

  it('is the newer copy when nothing was typed', () => {
    const newer = { ...base, motorised: true, licence: 'CC-BY-SA-4.0' };
    expect(rebaseForm(base, base, newer)).toEqual(newer);
  });
});
