import { Box, Flex, Heading } from '@chakra-ui/react';
import { useId, type ReactNode } from 'react';

function CautionIcon() {
  return (
    <svg width="28" height="28" viewBox="0 0 24 24" aria-hidden="true" style={{ flexShrink: 0 }}>
      <path d="M12 2.5 22.5 21h-21z" fill="var(--chakra-colors-amber-600)" strokeLinejoin="round" />
      <path d="M12 9v6" stroke="var(--chakra-colors-graphite)" strokeWidth="2.2" strokeLinecap="round" />
      <circle cx="12" cy="18" r="1.3" fill="var(--chakra-colors-graphite)" />
    </svg>
  );
}

/** Safety notes look the same everywhere (DESIGN.md §5): an amber border and icon, graphite text. */
export function CautionFrame({ title, children }: { title: string; children: ReactNode }) {
  const headingId = useId();
  return (
    <Box
      as="section"
      aria-labelledby={headingId}
      borderWidth="2px"
      borderColor="amber.600"
      borderRadius="md"
      bg="bg.panel"
      color="graphite"
      p="4"
    >
      <Flex gap="3" align="flex-start">
        <CautionIcon />
        <Box>
          <Heading as="h2" id={headingId} size="md" fontWeight="600" color="graphite">
            {title}
          </Heading>
          {children}
        </Box>
      </Flex>
    </Box>
  );
}
