import type { QueryClient } from '@tanstack/react-query';
import { Avatar, Badge, Box, HStack, Stack, Text } from '@chakra-ui/react';
import type { LoaderFunctionArgs } from 'react-router';
import { EmptyState, Page } from '../../components/page';
import { useMe } from '../../features/auth/api/get-me';
import { requireMember } from '../../features/auth/require-member';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireMember(queryClient, request);
    return null;
  };

export default function WorkshopRoute() {
  const { data: member } = useMe();
  if (!member) return null;
  return (
    <Page title="My workshop" lead="Your plans, your adaptations of other people's plans, and your build reports.">
      <HStack gap="4" bg="bg.panel" borderWidth="1px" borderColor="border" borderRadius="lg" p="4">
        <Avatar.Root size="lg">
          <Avatar.Fallback name={member.displayName} />
          {member.avatarUrl && <Avatar.Image src={member.avatarUrl} alt="" />}
        </Avatar.Root>
        <Box>
          <Text fontWeight="600" fontSize="lg">
            {member.displayName}
          </Text>
          <Text color="fg.muted">
            @{member.login} · {member.email}
          </Text>
        </Box>
        {member.role !== 'member' && (
          <Badge colorPalette="walnut" ml="auto" textTransform="capitalize">
            {member.role}
          </Badge>
        )}
      </HStack>
      <Stack gap="4">
        <EmptyState title="You have no plans yet">
          <Text>Plans you create, with their drafts and published revisions, will be listed here.</Text>
        </EmptyState>
      </Stack>
    </Page>
  );
}
