import { CreateMembers1764626400000 } from './1764626400000-CreateMembers';
import { AddAccounts1764720000000 } from './1764720000000-AddAccounts';
import { AddPlans1764806400000 } from './1764806400000-AddPlans';
import { AddPartUpdatedAt1796171415305 } from './1796171415305-AddPartUpdatedAt';
import { AddReviewDecisions1796171681558 } from './1796171681558-AddReviewDecisions';
import { AddDrawingClaims1796171440593 } from './1796171440593-AddDrawingClaims';
import { AddShopProfiles1796171748797 } from './1796171748797-AddShopProfiles';
import { AddPlansPublishedIndexes1796172522256 } from './1796172522256-AddPlansPublishedIndexes';
import { AddPlansRatingOrderIndex1796174983124 } from './1796174983124-AddPlansRatingOrderIndex';

/** Committed migrations in order; a committed migration is never rewritten. */
export const migrations = [
  CreateMembers1764626400000,
  AddAccounts1764720000000,
  AddPlans1764806400000,
  AddPartUpdatedAt1796171415305,
  AddDrawingClaims1796171440593,
  AddReviewDecisions1796171681558,
  AddShopProfiles1796171748797,
  AddPlansPublishedIndexes1796172522256,
  AddPlansRatingOrderIndex1796174983124,
];
