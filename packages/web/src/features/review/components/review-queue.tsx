import { Box, Heading, Link, Stack, Text } from '@chakra-ui/react';
import { Link as RouterLink } from 'react-router';
import type { Submission } from '../api/types';
import { formatDateTime } from '../wording';
import { checklistSummary, ReviewChecklist } from './review-checklist';

/** The submissions waiting for a decision, the longest waiting first, each with its checklist. */
export function ReviewQueue({
  submissions,
  submissionHref,
}: {
  submissions: Submission[];
  submissionHref: (slug: string, number: number) => string;
}) {
  return (
    <Stack as="ol" gap="4" listStyleType="none" ps="0" aria-label="Submitted revisions">
      {submissions.map((submission) => {
        const { plan, number } = submission;
        return (
          <Box
            as="li"
            key={`${plan.slug}-${number}`}
            borderWidth="1px"
            borderColor="border"
            borderRadius="md"
            bg="bg.panel"
            p={{ base: '4', md: '5' }}
          >
            <Stack gap="3">
              <Box>
                <Heading as="h2" size="md" fontWeight="600">
                  <Link asChild color="steel.700">
                    <RouterLink to={submissionHref(plan.slug, number)}>
                      {plan.title}, r{number}
                    </RouterLink>
                  </Link>
                </Heading>
                <Text color="fg.muted" fontSize="sm">
                  By {plan.designer.displayName} · submitted {formatDateTime(submission.submittedAt)}
                  {submission.ownPlan ? ' · your own plan' : ''}
                </Text>
              </Box>
              {submission.changelog.trim() && <Text whiteSpace="pre-wrap">{submission.changelog}</Text>}
              <Text fontWeight="500">{checklistSummary(submission.checklist)}</Text>
              <ReviewChecklist checklist={submission.checklist} label={`Checklist of ${plan.title}, r${number}`} />
            </Stack>
          </Box>
        );
      })}
    </Stack>
  );
}
