export type MemberRole = 'member' | 'moderator' | 'admin';

/** A member's public profile (`GET /api/members/:login`). */
export interface MemberProfile {
  id: number;
  login: string;
  displayName: string;
  avatarUrl: string | null;
  role: MemberRole;
  memberSince: string;
}

/** A row of the admins' Members table. */
export interface AdminMember extends MemberProfile {
  email: string;
  suspended: boolean;
  suspendedAt: string | null;
  lastSignInAt: string | null;
}

export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

export type AuditAction =
  | 'moderator_granted'
  | 'moderator_revoked'
  | 'admin_granted'
  | 'admin_revoked'
  | 'suspended'
  | 'restored'
  | 'revision_published'
  | 'revision_sent_back'
  | 'revision_declined'
  | 'revision_hidden'
  | 'revision_unhidden';

export interface MemberRef {
  id: number;
  login: string;
  displayName: string;
  avatarUrl: string | null;
}

export interface AuditEntry {
  id: number;
  actor: MemberRef | null;
  subject: MemberRef;
  action: AuditAction;
  /** The revision a review decision was about (its subject is the designer); null for role and status changes. */
  revision: { planSlug: string; planTitle: string; number: number } | null;
  at: string;
}
