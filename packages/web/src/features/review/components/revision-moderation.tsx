import { Button, HStack, Stack, Text } from '@chakra-ui/react';
import type { RevisionState } from '../api/types';
import { DecisionDialog } from './decision-dialog';
import { DecisionOutcome } from './decision-outcome';
import { useDecision } from './use-decision';

/**
 * On the plan page, for moderators: hide a published revision (with a reason) or restore a hidden
 * one. Not shown on the moderator's own plan, which another moderator looks after.
 */
export function RevisionModeration({
  slug,
  number,
  state,
  planTitle,
  designerName,
  onDecided,
}: {
  slug: string;
  number: number;
  state: RevisionState;
  planTitle: string;
  designerName: string;
  /** Keeps this revision in view: hiding the latest one would otherwise switch the page to the one before. */
  onDecided?: () => void;
}) {
  const decision = useDecision({ slug, number, what: `r${number} of “${planTitle}”`, designerName, onDecided });
  if (state !== 'published' && state !== 'hidden' && !decision.outcome) return null;
  return (
    <Stack as="section" aria-label="Moderation" gap="3" data-print-hide="">
      {decision.outcome && <DecisionOutcome outcome={decision.outcome} />}
      {state === 'hidden' && (
        <HStack gap="3" flexWrap="wrap" borderLeftWidth="4px" borderColor="brick.600" bg="bg.panel" p="3">
          <Text flex="1" minW="15rem">
            r{number} is hidden: only its designer and the moderators see it.
          </Text>
          <Button colorPalette="steel" size="sm" onClick={() => decision.start('unhide')}>
            Restore
          </Button>
        </HStack>
      )}
      {state === 'published' && (
        <HStack gap="3" justify="flex-end">
          <Button colorPalette="brick" variant="outline" size="sm" onClick={() => decision.start('hide')}>
            Hide this revision
          </Button>
        </HStack>
      )}
      <DecisionDialog decision={decision} />
    </Stack>
  );
}
