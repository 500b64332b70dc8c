import { Box } from '@chakra-ui/react';
import type { ReactNode } from 'react';

export type NoticeTone = 'sage' | 'brick' | 'amber';

/**
 * A one-line result or warning with a coloured edge: sage for done, brick for refused or failed
 * (read out at once, as an alert), amber for a caution. The text stays graphite on every tone.
 */
export function Notice({ tone, children }: { tone: NoticeTone; children: ReactNode }) {
  return (
    <Box
      role={tone === 'brick' ? 'alert' : 'status'}
      borderLeftWidth="4px"
      borderColor={`${tone}.600`}
      bg={`${tone}.50`}
      color="graphite"
      p="3"
      borderRadius="sm"
    >
      {children}
    </Box>
  );
}
