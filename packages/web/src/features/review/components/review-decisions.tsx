import { Box, Heading, List, Stack, Text } from '@chakra-ui/react';
import { useDecisions } from '../api/get-decisions';
import type { ReviewDecision, ReviewDecisionKind } from '../api/types';
import { formatDateTime } from '../wording';

const PAST: Record<ReviewDecisionKind, string> = {
  publish: 'Published',
  'send-back': 'Sent back',
  decline: 'Declined',
  hide: 'Hidden',
  unhide: 'Restored',
};

/** Decisions whose notes the designer has to act on or know about, shown big when they are the latest. */
const PROMINENT: ReadonlySet<ReviewDecisionKind> = new Set(['send-back', 'decline', 'hide']);

const byline = (decision: ReviewDecision) =>
  `${PAST[decision.decision]} by ${decision.moderator?.displayName ?? 'a former moderator'} on ${formatDateTime(decision.at)}`;

/**
 * A revision's review decisions for its designer, newest first: the latest send-back notes (or the
 * reason of a decline or hide) in a panel of their own, the earlier decisions below.
 */
export function ReviewDecisions({ slug, number }: { slug: string; number: number }) {
  const decisions = useDecisions(slug, number);
  if (decisions.isPending) return null;
  if (decisions.isError)
    return (
      <Text role="alert" color="brick.700">
        The review decisions could not be loaded: {decisions.error.message}
      </Text>
    );
  const [latest, ...earlier] = decisions.data;
  if (!latest) return null;
  const prominent = PROMINENT.has(latest.decision);
  return (
    <Stack as="section" aria-label="Review decisions" gap="3">
      <Box
        borderWidth="1px"
        borderLeftWidth={prominent ? '4px' : '1px'}
        borderColor={prominent ? (latest.decision === 'send-back' ? 'steel.600' : 'brick.600') : 'border'}
        bg="bg.panel"
        borderRadius="md"
        p="4"
      >
        <Heading as="h2" size="md" color="walnut.700" fontWeight="600">
          {latest.decision === 'send-back' ? 'What the moderator asks you to change' : 'Latest review decision'}
        </Heading>
        <Text color="fg.muted" fontSize="sm" mt="1">
          {byline(latest)}
        </Text>
        {latest.notes.trim() ? (
          <Text mt="3" whiteSpace="pre-wrap" fontSize={prominent ? 'md' : 'sm'}>
            {latest.notes}
          </Text>
        ) : (
          <Text mt="3" color="fg.muted" fontSize="sm">
            No notes.
          </Text>
        )}
      </Box>
      {earlier.length > 0 && (
        <Box>
          <Text fontWeight="600" fontSize="sm">
            Earlier decisions
          </Text>
          <List.Root variant="plain" gap="2" mt="1" aria-label="Earlier review decisions">
            {earlier.map((decision) => (
              <List.Item key={decision.id} display="block" fontSize="sm">
                <Text color="fg.muted">{byline(decision)}</Text>
                {decision.notes.trim() && <Text whiteSpace="pre-wrap">{decision.notes}</Text>}
              </List.Item>
            ))}
          </List.Root>
        </Box>
      )}
    </Stack>
  );
}
