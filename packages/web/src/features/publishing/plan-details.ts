import type { OwnPlan, PlanDetailsInput } from './api/types';

/** A fixed word list (categories, tools, licences) as the form offers it; the route passes the plans' own. */
export interface Choice {
  value: string;
  label: string;
}

export interface PlanVocabulary {
  categories: Choice[];
  tools: Choice[];
  licences: Choice[];
}

/** The form as typed: tags as one line of text, separated by commas. */
export interface PlanDetailsForm {
  title: string;
  summary: string;
  category: string;
  tags: string;
  toolsNeeded: string[];
  licence: string;
  motorised: boolean;
}

export type PlanField = keyof PlanDetailsForm;
export type PlanFieldErrors = Partial<Record<PlanField, string>>;

export const EMPTY_PLAN_FORM: PlanDetailsForm = {
  title: '',
  summary: '',
  category: '',
  tags: '',
  toolsNeeded: [],
  licence: '',
  motorised: false,
};

export function planFormOf(plan: OwnPlan): PlanDetailsForm {
  return {
    title: plan.title,
    summary: plan.summary,
    category: plan.category,
    tags: plan.tags.join(', '),
    toolsNeeded: plan.tools,
    licence: plan.licence,
    motorised: plan.motorised,
  };
}

export function tagsOf(text: string): string[] {
  return text
    .split(',')
    .map((tag) => tag.trim().toLowerCase())
    .filter((tag) => tag !== '');
}

/** The server's rules for a plan's details (`CreatePlanDto`), checked before sending, in its words. */
export function planFormErrors(form: PlanDetailsForm, vocabulary: PlanVocabulary): PlanFieldErrors {
  const errors: PlanFieldErrors = {};
  const title = form.title.trim();
  const summary = form.summary.trim();
  const tags = tagsOf(form.tags);
  if (title.length < 3 || title.length > 120) errors.title = 'The title needs 3 to 120 characters.';
  if (summary.length < 10 || summary.length > 500) errors.summary = 'The summary needs 10 to 500 characters.';
  if (!vocabulary.categories.some((choice) => choice.value === form.category)) {
    errors.category = 'Choose a category from the list.';
  }
  if (tags.length > 12) errors.tags = 'At most 12 tags.';
  else if (tags.some((tag) => tag.length > 30)) errors.tags = 'Each tag needs 1 to 30 characters.';
  else if (new Set(tags).size !== tags.length) errors.tags = 'Each tag once.';
  if (!vocabulary.licences.some((choice) => choice.value === form.licence)) {
    errors.licence = 'Choose one of the open licences.';
  }
  return errors;
}

export function planDetailsOf(form: PlanDetailsForm): PlanDetailsInput {
  return {
    title: form.title.trim(),
    summary: form.summary.trim(),
    category: form.category,
    tags: tagsOf(form.tags),
    toolsNeeded: form.toolsNeeded,
    licence: form.licence,
    motorised: form.motorised,
  };
}

// The validation messages name their field; each is shown beside it.
const FIELD_WORDS: Array<[RegExp, PlanField]> = [
  [/title/i, 'title'],
  [/summary/i, 'summary'],
  [/categor/i, 'category'],
  [/tag/i, 'tags'],
  [/tool/i, 'toolsNeeded'],
  [/licen[cs]e/i, 'licence'],
  [/motorised/i, 'motorised'],
];

/**
 * The server's validation `details` (a list of messages) placed beside their fields; anything that
 * names no field is returned in `other`.
 */
export function serverFieldErrors(details: unknown): { fields: PlanFieldErrors; other: string[] } {
  const fields: PlanFieldErrors = {};
  const other: string[] = [];
  for (const message of Array.isArray(details) ? details : []) {
    if (typeof message !== 'string') continue;
    const field = FIELD_WORDS.find(([words]) => words.test(message))?.[1];
    if (field && !fields[field]) fields[field] = message;
    else if (!field) other.push(message);
  }
  return { fields, other };
}

export function sameForm(a: PlanDetailsForm, b: PlanDetailsForm): boolean {
  return (
    a.title === b.title &&
    a.summary === b.summary &&
    a.category === b.category &&
    a.tags === b.tags &&
    a.licence === b.licence &&
    a.motorised === b.motorised &&
    a.toolsNeeded.length === b.toolsNeeded.length &&
    a.toolsNeeded.every((tool) => b.toolsNeeded.includes(tool))
  );
}

/**
 * The form on top of a newer saved copy of the plan: each field the member changed since `base` (the
 * copy the form started from) keeps their value; every other field takes the newer copy's, so that
 * saving after a 409 overwrites only what the member meant to change.
 */
export function rebaseForm(form: PlanDetailsForm, base: PlanDetailsForm, next: PlanDetailsForm): PlanDetailsForm {
  const changed = <K extends PlanField>(field: K) =>
    field === 'toolsNeeded'
      ? form.toolsNeeded.join('\u0000') !== base.toolsNeeded.join('\u0000')
      : form[field] !== base[field];
  const pick = <K extends PlanField>(field: K): PlanDetailsForm[K] => (changed(field) ? form[field] : next[field]);
  return {
    title: pick('title'),
    summary: pick('summary'),
    category: pick('category'),
    tags: pick('tags'),
    toolsNeeded: pick('toolsNeeded'),
    licence: pick('licence'),
    motorised: pick('motorised'),
  };
}
