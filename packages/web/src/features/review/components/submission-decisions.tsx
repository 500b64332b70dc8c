import { Box, Button, Heading, HStack, Stack, Text } from '@chakra-ui/react';
import type { Submission } from '../api/types';
import { stateWord } from '../wording';
import { DecisionDialog } from './decision-dialog';
import { DecisionOutcome } from './decision-outcome';
import { checklistSummary, ReviewChecklist } from './review-checklist';
import { useDecision } from './use-decision';

/** The desk's panel above a submission: its checklist and the three decisions. */
export function SubmissionDecisions({ submission }: { submission: Submission }) {
  const { plan, number, state } = submission;
  const what = `r${number} of “${plan.title}”`;
  const decision = useDecision({ slug: plan.slug, number, what, designerName: plan.designer.displayName });
  const waiting = state === 'submitted';

  return (
    <Stack
      as="section"
      aria-label="Review"
      gap="4"
      borderWidth="1px"
      borderColor="border"
      borderRadius="md"
      bg="bg.panel"
      p={{ base: '4', md: '5' }}
    >
      <Box>
        <Heading as="h2" size="lg" color="walnut.700" fontWeight="600">
          Checklist
        </Heading>
        <Text color="fg.muted" fontSize="sm">
          {checklistSummary(submission.checklist)}. Also read the drawing, notes and attachments below: is anything
          copied, is anything unsafe?
        </Text>
      </Box>
      <ReviewChecklist checklist={submission.checklist} />
      {submission.changelog.trim() && (
        <Box>
          <Text fontWeight="600">Changelog</Text>
          <Text whiteSpace="pre-wrap">{submission.changelog}</Text>
        </Box>
      )}

      {decision.outcome && <DecisionOutcome outcome={decision.outcome} />}
      {!decision.outcome && !waiting && (
        <Text role="status">
          r{number} is {stateWord(state)}; it is no longer waiting for a decision.
        </Text>
      )}
      {waiting && submission.ownPlan && (
        <Text role="note" color="fg.muted">
          This is your own plan: another moderator decides on it.
        </Text>
      )}
      {waiting && !submission.ownPlan && (
        <HStack gap="3" flexWrap="wrap">
          <Button colorPalette="steel" onClick={() => decision.start('publish')}>
            Publish
          </Button>
          <Button colorPalette="steel" variant="outline" onClick={() => decision.start('send-back')}>
            Send back
          </Button>
          <Button colorPalette="brick" variant="outline" onClick={() => decision.start('decline')}>
            Decline
          </Button>
        </HStack>
      )}
      <DecisionDialog decision={decision} />
    </Stack>
  );
}
