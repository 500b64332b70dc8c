import type { QueryClient } from '@tanstack/react-query';
import { Text } from '@chakra-ui/react';
import type { LoaderFunctionArgs } from 'react-router';
import { data } from 'react-router';
import { EmptyState, Page } from '../../components/page';
import { requireMember } from '../../features/auth/require-member';
import { canReview } from '../../features/auth/roles';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const member = await requireMember(queryClient, request);
    if (!canReview(member))
      throw data('The review desk is for moderators.', {
        status: 403,
        statusText: 'The review desk is for moderators.',
      });
    return null;
  };

export default function ReviewDeskRoute() {
  return (
    <Page title="Review desk" lead="Submitted revisions waiting for a decision, and open flags from members.">
      <EmptyState title="Nothing is waiting for review">
        <Text>Submitted revisions and open flags will be listed here, oldest first.</Text>
      </EmptyState>
    </Page>
  );
}
