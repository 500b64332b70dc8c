import { Button, HStack, Stack, Text } from '@chakra-ui/react';
import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';
import { data, useSearchParams } from 'react-router';
import { EmptyState, Page } from '../../components/page';
import { paths } from '../../config/paths';
import { requireMember } from '../../features/auth/require-member';
import { canReview } from '../../features/auth/roles';
import { REVIEW_PAGE_SIZE, reviewQueueQueryOptions, useReviewQueue } from '../../features/review/api/get-review-queue';
import { ReviewQueue } from '../../features/review/components/review-queue';

function pageOf(params: URLSearchParams): number {
  const page = Number(params.get('page') ?? '1');
  return Number.isInteger(page) && page > 0 ? page : 1;
}

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const member = await requireMember(queryClient, request);
    if (!canReview(member))
      throw data('The review desk is for moderators.', {
        status: 403,
        statusText: 'The review desk is for moderators.',
      });
    await queryClient.ensureQueryData(reviewQueueQueryOptions(pageOf(new URL(request.url).searchParams)));
    return null;
  };

export default function ReviewDeskRoute() {
  const [params, setParams] = useSearchParams();
  const page = pageOf(params);
  const queue = useReviewQueue(page);
  const total = queue.data?.total ?? 0;
  const pages = Math.max(1, Math.ceil(total / REVIEW_PAGE_SIZE));
  const goTo = (next: number) => setParams(next > 1 ? { page: String(next) } : {});

  return (
    <Page
      title="Review desk"
      lead="Submitted revisions waiting for a decision, the longest waiting first. Open one to read it in full against its checklist, then publish it, send it back with notes, or decline it."
    >
      {queue.isError && (
        <Text role="alert" color="brick.700">
          The queue could not be loaded: {queue.error.message}
        </Text>
      )}
      {queue.data && queue.data.items.length === 0 && (
        <EmptyState title={total === 0 ? 'Nothing is waiting for review' : 'This page of the queue is empty'}>
          {total === 0 ? (
            <Text>When a designer submits a revision, it appears here with its checklist.</Text>
          ) : (
            <Button variant="outline" colorPalette="steel" size="sm" onClick={() => goTo(1)}>
              Back to the first page
            </Button>
          )}
        </EmptyState>
      )}
      {queue.data && queue.data.items.length > 0 && (
        <Stack gap="4">
          <Text color="fg.muted" className="numeric" aria-live="polite">
            {total === 1 ? '1 revision waits' : `${total} revisions wait`} for a decision
            {pages > 1 ? ` · page ${page} of ${pages}` : ''}
          </Text>
          <ReviewQueue submissions={queue.data.items} submissionHref={paths.reviewSubmission.getHref} />
          {pages > 1 && (
            <HStack gap="2" justify="flex-end">
              <Button size="sm" variant="outline" disabled={page <= 1} onClick={() => goTo(page - 1)}>
                Previous page
              </Button>
              <Button size="sm" variant="outline" disabled={page >= pages} onClick={() => goTo(page + 1)}>
                Next page
              </Button>
            </HStack>
          )}
        </Stack>
      )}
    </Page>
  );
}
