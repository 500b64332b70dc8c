import type { INestApplication } from '@nestjs/common';
import { hiddenPlan, publishedPlan, submittedPlan } from './review-helpers';

/** One plan for each deciding actor: a decision changes its plan's state, so the next actor needs another. */
export interface Deciders {
  moderator: string;
  admin: string;
}

/** The owner's plans the matrix's review decisions act on. */
export interface ReviewMatrixPlans {
  /** r1 submitted. */
  publish: Deciders;
  sendBack: Deciders;
  decline: Deciders;
  /** r1 published. */
  hide: Deciders;
  /** r1 hidden. */
  unhide: Deciders;
}

export async function createReviewMatrixPlans(app: INestApplication, login: string): Promise<ReviewMatrixPlans> {
  const each = async (make: () => Promise<string>): Promise<Deciders> => ({
    moderator: await make(),
    admin: await make(),
  });
  return {
    publish: await each(() => submittedPlan(app, login)),
    sendBack: await each(() => submittedPlan(app, login)),
    decline: await each(() => submittedPlan(app, login)),
    hide: await each(() => publishedPlan(app, login)),
    unhide: await each(() => hiddenPlan(app, login, 'demo-admin')),
  };
}
