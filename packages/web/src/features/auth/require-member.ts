import type { QueryClient } from '@tanstack/react-query';
import { redirect } from 'react-router';
import { paths } from '../../config/paths';
import { meQueryOptions, type Member } from './api/get-me';

/** For route loaders: the signed-in member, or a redirect to the sign-in page that comes back here. */
export async function requireMember(queryClient: QueryClient, request: Request): Promise<Member> {
  const member = await queryClient.ensureQueryData(meQueryOptions());
  if (!member) {
    const url = new URL(request.url);
    throw redirect(paths.signIn.getHref(url.pathname + url.search));
  }
  return member;
}
