import { Badge, Box, Button, Heading, HStack, Link, Stack, Text } from '@chakra-ui/react';
import { Link as RouterLink } from 'react-router';
import type { MyPlan, RevisionState } from '../api/get-my-plans';

const STATES: Record<RevisionState, { name: string; palette: string }> = {
  draft: { name: 'Draft', palette: 'gray' },
  submitted: { name: 'Waiting for review', palette: 'steel' },
  published: { name: 'Published', palette: 'sage' },
  'sent-back': { name: 'Sent back', palette: 'amber' },
  declined: { name: 'Declined', palette: 'brick' },
  hidden: { name: 'Hidden', palette: 'gray' },
};

const IN_PROGRESS: readonly RevisionState[] = ['draft', 'submitted', 'sent-back'];

const dateText = (iso: string) =>
  new Date(iso).toLocaleDateString('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });

export interface MyPlansLinks {
  plan(slug: string): string;
  revision(slug: string, number: number): string;
}

/** Each of the designer's plans with every revision and its state, and the next step for it. */
export function MyPlansList({ plans, links }: { plans: readonly MyPlan[]; links: MyPlansLinks }) {
  return (
    <Stack as="ul" gap="4" listStyleType="none" aria-label="My plans">
      {plans.map((plan) => {
        const working = plan.revisions.findLast((revision) => IN_PROGRESS.includes(revision.state));
        return (
          <Box
            as="li"
            key={plan.slug}
            aria-label={plan.title}
            bg="bg.panel"
            borderWidth="1px"
            borderColor="border"
            borderRadius="lg"
            p={{ base: '4', md: '5' }}
          >
            <HStack justify="space-between" align="flex-start" gap="3" wrap="wrap">
              <Box minW="0" flex="1">
                <Heading as="h3" size="md" fontWeight="600">
                  <Link asChild color="walnut.700">
                    <RouterLink to={working ? links.revision(plan.slug, working.number) : links.plan(plan.slug)}>
                      {plan.title}
                    </RouterLink>
                  </Link>
                </Heading>
                <Text color="fg.muted" fontSize="sm" mt="1" lineClamp={2}>
                  {plan.summary}
                </Text>
              </Box>
              {working ? (
                <Button asChild size="sm" colorPalette="steel">
                  <RouterLink to={links.revision(plan.slug, working.number)}>
                    {working.state === 'submitted' ? `Open r${working.number}` : `Edit r${working.number}`}
                  </RouterLink>
                </Button>
              ) : (
                plan.latestRevision && (
                  <Button asChild size="sm" variant="outline" colorPalette="steel">
                    <RouterLink to={links.revision(plan.slug, plan.latestRevision.number)}>
                      Open r{plan.latestRevision.number}
                    </RouterLink>
                  </Button>
                )
              )}
            </HStack>
            <Stack as="ol" mt="3" gap="1" listStyleType="none" aria-label={`Revisions of ${plan.title}`}>
              {[...plan.revisions].reverse().map((revision) => (
                <HStack as="li" key={revision.number} gap="3" fontSize="sm" wrap="wrap">
                  <Link asChild color="steel.700" fontWeight="500" minW="8">
                    <RouterLink to={links.revision(plan.slug, revision.number)}>r{revision.number}</RouterLink>
                  </Link>
                  <Badge colorPalette={STATES[revision.state].palette} variant="subtle">
                    {STATES[revision.state].name}
                  </Badge>
                  <Text as="span" color="fg.muted" className="numeric">
                    {revision.publishedAt
                      ? `published ${dateText(revision.publishedAt)}`
                      : `saved ${dateText(revision.updatedAt)}`}
                  </Text>
                  {revision.state === 'published' && (
                    <Link asChild color="steel.700">
                      <RouterLink to={`${links.plan(plan.slug)}?r=${revision.number}`}>plan page</RouterLink>
                    </Link>
                  )}
                </HStack>
              ))}
            </Stack>
          </Box>
        );
      })}
    </Stack>
  );
}
