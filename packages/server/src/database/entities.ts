import { AuditEntry } from '../audit/entities/audit-entry.entity';
import { RefreshToken } from '../auth/entities/refresh-token.entity';
import { Session } from '../auth/entities/session.entity';
import { Member } from '../members/entities/member.entity';

/** Every entity, listed explicitly (no path globs), for the app and the migration CLI alike. */
export const entities = [Member, Session, RefreshToken, AuditEntry];
