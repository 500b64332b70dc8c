import { Box } from '@chakra-ui/react';

export interface Outcome {
  tone: 'sage' | 'brick';
  text: string;
}

/** The result of a decision, read out when it appears: sage for done, brick for refused. */
export function DecisionOutcome({ outcome }: { outcome: Outcome }) {
  return (
    <Box
      role={outcome.tone === 'brick' ? 'alert' : 'status'}
      borderLeftWidth="4px"
      borderColor={`${outcome.tone}.600`}
      bg={`${outcome.tone}.50`}
      color="graphite"
      p="3"
      borderRadius="sm"
    >
      {outcome.text}
    </Box>
  );
}
