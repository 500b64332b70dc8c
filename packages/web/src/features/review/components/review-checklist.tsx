import { Box, HStack, List, Text } from '@chakra-ui/react';
import type { ReviewCheck } from '../api/types';

function Mark({ ok }: { ok: boolean }) {
  return (
    <HStack as="span" gap="1" color={ok ? 'sage.700' : 'brick.700'} fontWeight="600" flexShrink={0} minW="5rem">
      <svg width="16" height="16" viewBox="0 0 16 16" aria-hidden="true">
        {ok ? (
          <path d="M3 8.5 6.5 12 13 4.5" fill="none" stroke="currentColor" strokeWidth="2.2" strokeLinecap="round" />
        ) : (
          <path d="M4 4 12 12M12 4 4 12" fill="none" stroke="currentColor" strokeWidth="2.2" strokeLinecap="round" />
        )}
      </svg>
      {ok ? 'OK' : 'Problem'}
    </HStack>
  );
}

/** The checks of a submission: each with a mark and its word (never colour alone), what was found, and each problem. */
export function ReviewChecklist({ checklist, label = 'Checklist' }: { checklist: ReviewCheck[]; label?: string }) {
  return (
    <List.Root variant="plain" gap="2" aria-label={label}>
      {checklist.map((check) => (
        <List.Item key={check.check} display="block" data-check={check.check} data-ok={check.ok}>
          <HStack gap="2" align="baseline" flexWrap="wrap">
            <Mark ok={check.ok} />
            <Text as="span" fontWeight="600">
              {check.label}
            </Text>
            <Text as="span" color="fg.muted" fontSize="sm">
              {check.summary}
            </Text>
          </HStack>
          {check.problems.length > 0 && (
            <Box ps={{ base: '0', sm: '5.5rem' }} mt="1">
              <List.Root gap="1" ps="4" fontSize="sm">
                {check.problems.map((problem) => (
                  <List.Item key={problem}>{problem}</List.Item>
                ))}
              </List.Root>
            </Box>
          )}
        </List.Item>
      ))}
    </List.Root>
  );
}

/** "All 4 checks pass" or "2 of 4 checks find problems". */
export function checklistSummary(checklist: ReviewCheck[]): string {
  const failing = checklist.filter((check) => !check.ok).length;
  return failing === 0
    ? `All ${checklist.length} checks pass`
    : `${failing} of ${checklist.length} checks ${failing === 1 ? 'finds a problem' : 'find problems'}`;
}
