import { CanActivate, ExecutionContext, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { Request } from 'express';
import { ForbiddenError } from '../common/domain-error';
import type { MemberRole } from '../members/entities/member.entity';
import { ROLES } from './roles.decorator';
import { sessionOf } from './session';

/** Enforces @Roles(); the handler's list overrides the controller's. */
@Injectable()
export class RolesGuard implements CanActivate {
  constructor(private readonly reflector: Reflector) {}

  canActivate(context: ExecutionContext): boolean {
    const roles = this.reflector.getAllAndOverride<MemberRole[] | undefined>(ROLES, [
      context.getHandler(),
      context.getClass(),
    ]);
    if (!roles?.length) return true;
    const { role } = sessionOf(context.switchToHttp().getRequest<Request>());
    if (roles.includes(role)) return true;
    throw new ForbiddenError('role_required', `This needs the ${roles.join(' or ')} role.`);
  }
}
