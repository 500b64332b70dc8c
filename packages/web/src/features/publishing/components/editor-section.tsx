import { Box, Heading, Stack, Text } from '@chakra-ui/react';
import type { ReactNode } from 'react';

/** One section of the designer's screens: a titled white panel, as a named region. */
export function EditorSection({
  title,
  lead,
  actions,
  children,
}: {
  title: string;
  lead?: ReactNode;
  actions?: ReactNode;
  children: ReactNode;
}) {
  return (
    <Stack
      as="section"
      aria-label={title}
      gap="4"
      bg="bg.panel"
      borderWidth="1px"
      borderColor="border"
      borderRadius="lg"
      p={{ base: '4', md: '6' }}
    >
      <Box display="flex" gap="3" alignItems="flex-start" justifyContent="space-between" flexWrap="wrap">
        <Box>
          <Heading as="h2" size="lg" color="walnut.700" fontWeight="600">
            {title}
          </Heading>
          {lead && (
            <Text mt="1" color="fg.muted" fontSize="sm" maxW="3xl">
              {lead}
            </Text>
          )}
        </Box>
        {actions}
      </Box>
      {children}
    </Stack>
  );
}
