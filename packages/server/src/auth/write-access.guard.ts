import { CanActivate, ExecutionContext, Injectable } from '@nestjs/common';
import type { Request } from 'express';
import { ForbiddenError } from '../common/domain-error';
import { isUnsafeMethod } from './http-methods';
import type { Session } from './session';

/** A suspended member may still read; every change they ask for is refused. */
@Injectable()
export class WriteAccessGuard implements CanActivate {
  canActivate(context: ExecutionContext): boolean {
    const request = context.switchToHttp().getRequest<Request>();
    const session = request.user as Session | undefined;
    if (!session?.suspended || !isUnsafeMethod(request.method)) return true;
    throw new ForbiddenError('member_suspended', 'Your account is suspended: you can read, but not change anything.');
  }
}
