import type { QueryClient } from '@tanstack/react-query';
import { data, redirect } from 'react-router';
import { paths } from '../../config/paths';
import { meQueryOptions, type Member } from './api/get-me';
import { isAdmin } from './roles';

/** For route loaders: the signed-in member, or a redirect to the sign-in page that comes back here. */
export async function requireMember(queryClient: QueryClient, request: Request): Promise<Member> {
  const member = await queryClient.ensureQueryData(meQueryOptions());
  if (!member) {
    const url = new URL(request.url);
    throw redirect(paths.signIn.getHref(url.pathname + url.search));
  }
  return member;
}

/** For route loaders of admin pages: as requireMember, and a 403 for everyone but admins. */
export async function requireAdmin(queryClient: QueryClient, request: Request, what: string): Promise<Member> {
  const member = await requireMember(queryClient, request);
  if (!isAdmin(member)) throw data(`${what} is for admins.`, { status: 403, statusText: `${what} is for admins.` });
  return member;
}
