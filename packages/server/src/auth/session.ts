import type { Request } from 'express';
import type { MemberRole } from '../members/entities/member.entity';
import { UnauthenticatedError } from '../common/domain-error';

export const SESSION_COOKIE = 'jw_session';
export const REFRESH_COOKIE = 'jw_refresh';
export const OAUTH_STATE_COOKIE = 'jw_oauth_state';
/** The refresh cookie goes only to the token routes. */
export const REFRESH_COOKIE_PATH = '/api/auth';

/** The signed-in member of a request, read fresh from the database on every request. */
export interface Session {
  memberId: number;
  sessionId: string;
  role: MemberRole;
  suspended: boolean;
}

/** What an access token carries: whose it is and which session it belongs to; roles are looked up. */
export interface AccessTokenPayload {
  sub: string;
  sid: string;
}

export function sessionOf(request: Request): Session {
  const session = request.user as Session | undefined;
  if (!session) throw new UnauthenticatedError('not_signed_in', 'Sign in first.');
  return session;
}

/** Only a path on this site may be a place to return to after sign-in (no open redirect). */
export function safeReturnPath(value: unknown): string {
  return typeof value === 'string' && /^\/(?![/\\])[^\s]*$/.test(value) ? value : '/';
}
