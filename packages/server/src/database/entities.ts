import { AuditEntry } from '../audit/entities/audit-entry.entity';
import { RefreshToken } from '../auth/entities/refresh-token.entity';
import { Session } from '../auth/entities/session.entity';
import { Member } from '../members/entities/member.entity';
import { Attachment } from '../plans/entities/attachment.entity';
import { Drawing } from '../plans/entities/drawing.entity';
import { Part } from '../plans/entities/part.entity';
import { PlanTool } from '../plans/entities/plan-tool.entity';
import { Plan } from '../plans/entities/plan.entity';
import { Revision } from '../plans/entities/revision.entity';
import { ReviewDecision } from '../review/entities/review-decision.entity';
import { ShopProfile } from '../shop-profiles/entities/shop-profile.entity';

/** Every entity, listed explicitly (no path globs), for the app and the migration CLI alike. */
export const entities = [
  Member,
  Session,
  RefreshToken,
  AuditEntry,
  Plan,
  PlanTool,
  Revision,
  Drawing,
  Part,
  Attachment,
  ReviewDecision,
  ShopProfile,
];
