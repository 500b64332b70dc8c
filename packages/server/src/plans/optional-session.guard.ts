import { Injectable } from '@nestjs/common';
import { AuthGuard } from '@nestjs/passport';
import type { Request } from 'express';
import type { Session } from '../auth/session';
import type { Viewer } from './plans.service';

/**
 * For public reads that show the owner more (their drafts): reads the session when there is a valid
 * one and lets everyone through. The global guard skips @Public() routes, so this one does the reading.
 */
@Injectable()
export class OptionalSessionGuard extends AuthGuard('jwt') {
  override handleRequest<T>(_error: unknown, session: T): T {
    return session;
  }
}

export function viewerOf(request: Request): Viewer {
  const session = request.user as Session | undefined | false;
  return session ? { memberId: session.memberId, role: session.role } : null;
}
