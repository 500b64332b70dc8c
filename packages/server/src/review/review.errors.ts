import { ForbiddenError } from '../common/domain-error';

/** A moderator deciding on a revision of a plan they designed themselves. */
export class OwnPlanDecisionError extends ForbiddenError {
  constructor() {
    super(
      'own_plan_review',
      'This is your own plan: another moderator decides on its revisions, so that every plan is looked at by a second pair of eyes.',
    );
  }
}
