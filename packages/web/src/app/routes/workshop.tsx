import type { QueryClient } from '@tanstack/react-query';
import { Avatar, Badge, Box, Button, HStack, Stack, Text } from '@chakra-ui/react';
import { Link as RouterLink, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { EmptyState, Page } from '../../components/page';
import { paths } from '../../config/paths';
import { useMe } from '../../features/auth/api/get-me';
import { requireMember } from '../../features/auth/require-member';
import { myPlansQueryOptions, useMyPlans } from '../../features/workshop/api/get-my-plans';
import { MyPlansList } from '../../features/workshop/components/my-plans-list';

const pageOf = (text: string | null) => Math.max(1, Math.floor(Number(text)) || 1);

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireMember(queryClient, request);
    await queryClient.prefetchQuery(myPlansQueryOptions(pageOf(new URL(request.url).searchParams.get('page'))));
    return null;
  };

const links = {
  plan: (slug: string) => paths.plan.getHref(slug),
  revision: (slug: string, number: number) => paths.revisionEditor.getHref(slug, number),
};

export default function WorkshopRoute() {
  const { data: member } = useMe();
  const [params] = useSearchParams();
  const page = pageOf(params.get('page'));
  const plans = useMyPlans(page);
  if (!member) return null;
  const newPlan = (
    <Button asChild colorPalette="steel">
      <RouterLink to={paths.newPlan.getHref()}>New plan</RouterLink>
    </Button>
  );
  const pages = plans.data ? Math.ceil(plans.data.total / plans.data.pageSize) : 1;
  return (
    <Page
      title="My workshop"
      lead="Your plans with every revision: drafts to finish, submissions waiting for review, and what is published."
      actions={newPlan}
    >
      <HStack gap="4" bg="bg.panel" borderWidth="1px" borderColor="border" borderRadius="lg" p="4">
        <Avatar.Root size="lg">
          <Avatar.Fallback name={member.displayName} />
          {member.avatarUrl && <Avatar.Image src={member.avatarUrl} alt="" />}
        </Avatar.Root>
        <Box minW="0">
          <Text fontWeight="600" fontSize="lg">
            {member.displayName}
          </Text>
          <Text color="fg.muted" wordBreak="break-all">
            @{member.login} · {member.email}
          </Text>
        </Box>
        {member.role !== 'member' && (
          <Badge colorPalette="walnut" ml="auto" textTransform="capitalize">
            {member.role}
          </Badge>
        )}
      </HStack>
      <Stack gap="4" as="section" aria-label="My plans">
        <Text as="h2" fontSize="xl" fontWeight="600" color="walnut.700">
          My plans{plans.data ? ` (${plans.data.total})` : ''}
        </Text>
        {plans.isError && (
          <Text role="alert" color="brick.700">
            Your plans could not be loaded: {plans.error.message}
          </Text>
        )}
        {plans.data && plans.data.total === 0 && (
          <EmptyState title="You have no plans yet">
            <Text>Start one: give it a title and a category, then upload its drawings and write its notes.</Text>
            <Box mt="4">{newPlan}</Box>
          </EmptyState>
        )}
        {plans.data && plans.data.items.length > 0 && <MyPlansList plans={plans.data.items} links={links} />}
        {pages > 1 && (
          <HStack gap="3" justify="center">
            {page > 1 && (
              <Button asChild size="sm" variant="outline">
                <RouterLink to={`${paths.workshop.getHref()}?page=${page - 1}`}>Previous page</RouterLink>
              </Button>
            )}
            <Text fontSize="sm" className="numeric">
              Page {page} of {pages}
            </Text>
            {page < pages && (
              <Button asChild size="sm" variant="outline">
                <RouterLink to={`${paths.workshop.getHref()}?page=${page + 1}`}>Next page</RouterLink>
              </Button>
            )}
          </HStack>
        )}
      </Stack>
    </Page>
  );
}
