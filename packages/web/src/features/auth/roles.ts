import type { Member } from './api/get-me';

/** Moderators and admins work the review desk. */
export function canReview(member: Member | null | undefined): boolean {
  return member?.role === 'moderator' || member?.role === 'admin';
}

/** Admins manage members: roles and suspensions. */
export function isAdmin(member: Member | null | undefined): boolean {
  return member?.role === 'admin';
}
