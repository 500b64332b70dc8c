import { Button, HStack, Text } from '@chakra-ui/react';
import { Link as RouterLink } from 'react-router';
import { useStartRevision } from '../api/revision-actions';
import type { OwnRevisionSummary } from '../api/types';

const IN_PROGRESS = ['draft', 'submitted', 'sent-back'];
const FINISHED = ['published', 'declined', 'hidden'];

/**
 * What the designer can do from their own plan's page: go on with the revision in progress, or
 * start the next one once a revision is published.
 */
export function OwnerPlanActions({
  slug,
  revisions,
  editorHref,
  onStarted,
}: {
  slug: string;
  revisions: readonly OwnRevisionSummary[];
  editorHref(number: number): string;
  onStarted(number: number): void;
}) {
  const start = useStartRevision(slug);
  const working = revisions.findLast((revision) => IN_PROGRESS.includes(revision.state));
  // The next revision copies the latest published one, else the newest declined or hidden one.
  const finished = revisions.some((revision) => FINISHED.includes(revision.state));
  return (
    <HStack gap="2" wrap="wrap">
      {working ? (
        <Button asChild size="sm" colorPalette="steel">
          <RouterLink to={editorHref(working.number)}>
            {working.state === 'submitted'
              ? `Open r${working.number} (waiting for review)`
              : `Edit draft r${working.number}`}
          </RouterLink>
        </Button>
      ) : (
        finished && (
          <Button
            size="sm"
            colorPalette="steel"
            loading={start.isPending}
            onClick={() => start.mutate(undefined, { onSuccess: (next) => onStarted(next.number) })}
          >
            Start a new revision
          </Button>
        )
      )}
      {start.error && (
        <Text role="alert" color="brick.700" fontSize="sm">
          {start.error.message}
        </Text>
      )}
    </HStack>
  );
}
