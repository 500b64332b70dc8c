import { UnauthorizedException } from '@nestjs/common';
import type { Request } from 'express';
import type { MemberRole } from '../members/entities/member.entity';

export const SESSION_COOKIE = 'jw_session';
export const OAUTH_STATE_COOKIE = 'jw_oauth_state';

/** What a session token carries; the server re-reads the member where it matters. */
export interface Session {
  memberId: number;
  role: MemberRole;
}

export interface SessionTokenPayload {
  sub: string;
  role: MemberRole;
}

export function sessionOf(request: Request): Session {
  const session = request.user as Session | undefined;
  if (!session) throw new UnauthorizedException('Sign in first');
  return session;
}

/** Only a path on this site may be a place to return to after sign-in (no open redirect). */
export function safeReturnPath(value: unknown): string {
  return typeof value === 'string' && /^\/(?![/\\])[^\s]*$/.test(value) ? value : '/';
}
