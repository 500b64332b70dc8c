import { SetMetadata } from '@nestjs/common';
import type { MemberRole } from '../members/entities/member.entity';

export const ROLES = 'roles';

/** Only members holding one of these roles may use the route (checked by RolesGuard). */
export const Roles = (...roles: MemberRole[]) => SetMetadata(ROLES, roles);
