import { CanActivate, ExecutionContext, Injectable } from '@nestjs/common';
import type { Request } from 'express';
import { ForbiddenError } from '../common/domain-error';
import { isUnsafeMethod } from './http-methods';

export const CSRF_HEADER = 'x-requested-with';
export const CSRF_HEADER_VALUE = 'jigwright';

/**
 * Cross-site request forgery: every POST/PUT/PATCH/DELETE must carry `X-Requested-With: jigwright`.
 * A page on another site cannot add a custom header without a CORS preflight, which this server
 * never grants; SameSite cookies are the second line (DEVELOPERS.md, "Sessions and CSRF").
 */
@Injectable()
export class CsrfGuard implements CanActivate {
  canActivate(context: ExecutionContext): boolean {
    const request = context.switchToHttp().getRequest<Request>();
    if (!isUnsafeMethod(request.method) || request.get(CSRF_HEADER) === CSRF_HEADER_VALUE) return true;
    throw new ForbiddenError(
      'csrf_header_missing',
      `Changes must come from the Jigwright app (the ${CSRF_HEADER_VALUE} X-Requested-With header is missing).`,
    );
  }
}
