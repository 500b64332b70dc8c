import type { MemberRole } from '../members/entities/member.entity';
import { ForbiddenError } from './domain-error';

/** Who is asking, as far as ownership is concerned. */
export interface Actor {
  memberId: number;
  role: MemberRole;
}

/**
 * The one ownership check ("is this your plan?", "your build report", "your settings"): passes when
 * the actor owns the thing, or holds one of the roles that may act on anyone's; throws otherwise.
 * Returns the thing so that a service can write `const plan = assertOwnedBy(actor, found, p => p.ownerId)`.
 */
export function assertOwnedBy<T>(
  actor: Actor,
  resource: T,
  ownerIdOf: (resource: T) => number,
  {
    message = 'This belongs to another member.',
    alsoRoles = [],
  }: { message?: string; alsoRoles?: readonly MemberRole[] } = {},
): T {
  if (ownerIdOf(resource) === actor.memberId || alsoRoles.includes(actor.role)) return resource;
  throw new ForbiddenError('not_owner', message);
}
