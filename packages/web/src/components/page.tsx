import { Box, Heading, Stack, Text } from '@chakra-ui/react';
import { useEffect, type ReactNode } from 'react';

/** A page's title (also the document title), an optional lead paragraph, and its content. */
export function Page({
  title,
  lead,
  actions,
  children,
}: {
  title: string;
  lead?: ReactNode;
  actions?: ReactNode;
  children?: ReactNode;
}) {
  useEffect(() => {
    document.title = `${title} · Jigwright`;
  }, [title]);
  return (
    <Stack gap="6">
      <Box display="flex" gap="4" alignItems="flex-end" justifyContent="space-between" flexWrap="wrap">
        <Box>
          <Heading as="h1" size="2xl" color="walnut.700" fontWeight="600">
            {title}
          </Heading>
          {lead && (
            <Text mt="2" color="fg.muted" maxW="3xl">
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

/** What a list shows when it has nothing in it yet, with the next step to take. */
export function EmptyState({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <Box
      borderWidth="1px"
      borderStyle="dashed"
      borderColor="border"
      borderRadius="lg"
      bg="bg.panel"
      p="8"
      textAlign="center"
    >
      <Heading as="h2" size="md" color="graphite" fontWeight="600">
        {title}
      </Heading>
      {children && (
        <Box mt="2" color="fg.muted">
          {children}
        </Box>
      )}
    </Box>
  );
}
