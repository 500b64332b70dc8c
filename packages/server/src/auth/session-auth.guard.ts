import { ExecutionContext, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { AuthGuard } from '@nestjs/passport';
import { SessionError, type SessionFailure } from './auth.errors';
import { IS_PUBLIC } from './public.decorator';

/** Sorts passport-jwt's reasons for having no user into our failure codes. */
export function sessionFailureOf(info: unknown): SessionFailure {
  if (info instanceof Error && info.name === 'TokenExpiredError') return 'session_expired';
  if (info instanceof Error && info.message === 'No auth token') return 'not_signed_in';
  return 'session_invalid';
}

/** The one global guard: a valid session, unless the route is marked @Public(). */
@Injectable()
export class SessionAuthGuard extends AuthGuard('jwt') {
  constructor(private readonly reflector: Reflector) {
    super();
  }

  override canActivate(context: ExecutionContext) {
    const isPublic = this.reflector.getAllAndOverride<boolean>(IS_PUBLIC, [context.getHandler(), context.getClass()]);
    if (isPublic) return true;
    return super.canActivate(context);
  }

  override handleRequest<T>(error: unknown, session: T, info: unknown): T {
    if (error) throw error;
    if (!session) throw new SessionError(sessionFailureOf(info));
    return session;
  }
}
