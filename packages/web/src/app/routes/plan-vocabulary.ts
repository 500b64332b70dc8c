import { CATEGORY_NAMES, LICENCES, TOOLS } from '../../features/plans/vocabulary';
import type { PlanVocabulary } from '../../features/publishing/plan-details';

/** The plans' word lists as the designer's forms offer them (composed here: features do not import each other). */
export const planVocabulary: PlanVocabulary = {
  categories: Object.entries(CATEGORY_NAMES).map(([value, label]) => ({ value, label })),
  tools: Object.entries(TOOLS).map(([value, tool]) => ({ value, label: tool.name })),
  licences: Object.entries(LICENCES).map(([value, licence]) => ({ value, label: licence.name })),
};
