import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { PassportStrategy } from '@nestjs/passport';
import type { Request } from 'express';
import { ExtractJwt, Strategy } from 'passport-jwt';
import type { Environment } from '../config/environment';
import { SessionError } from './auth.errors';
import { SESSION_COOKIE, type AccessTokenPayload, type Session } from './session';
import { SessionsService } from './sessions.service';

function fromSessionCookie(request: Request): string | null {
  const cookies = request.cookies as Record<string, string> | undefined;
  return cookies?.[SESSION_COOKIE] ?? null;
}

/**
 * Verifies the access token, then reads its session and member: an ended session (sign-out,
 * suspension, a reused refresh token) is refused at once, and role changes count from the next request.
 */
@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy, 'jwt') {
  constructor(
    config: ConfigService<Environment, true>,
    private readonly sessions: SessionsService,
  ) {
    super({
      jwtFromRequest: ExtractJwt.fromExtractors([fromSessionCookie]),
      secretOrKey: config.get('JWT_SECRET', { infer: true }),
      algorithms: ['HS256'],
      ignoreExpiration: false,
    });
  }

  async validate(payload: AccessTokenPayload): Promise<Session> {
    const session = typeof payload.sid === 'string' ? await this.sessions.findActive(payload.sid) : null;
    if (!session || String(session.memberId) !== payload.sub) throw new SessionError('session_ended');
    return {
      memberId: session.memberId,
      sessionId: session.id,
      role: session.member.role,
      suspended: session.member.suspendedAt !== null,
    };
  }
}
