import { Box, Flex, Heading, Link, Stack, Text } from '@chakra-ui/react';
import { Link as RouterLink } from 'react-router';
import type { PlanCard as PlanCardData } from '../api/types';
import { CATEGORY_NAMES } from '../vocabulary';
import { PartsThumbnail } from './parts-thumbnail';

export function ratingText(rating: PlanCardData['rating']): string {
  return rating.count === 0 ? 'Not rated yet' : `Rated ${rating.average.toFixed(1)} of 5 by ${rating.count}`;
}

export function buildCountText(count: number): string {
  return count === 0 ? 'No build reports yet' : `Built ${count} ${count === 1 ? 'time' : 'times'}`;
}

/** A result in the library: the parts' drawing, title, designer, rating and build count. */
export function PlanCard({ plan, href }: { plan: PlanCardData; href: string }) {
  return (
    <Box as="article" borderWidth="1px" borderColor="border" borderRadius="md" bg="bg.panel" overflow="hidden">
      <Box borderBottomWidth="1px" borderColor="border">
        <PartsThumbnail thumbnail={plan.thumbnail} title={plan.title} />
      </Box>
      <Stack gap="1" p="4">
        <Text fontSize="xs" textTransform="uppercase" letterSpacing="wide" color="fg.muted">
          {CATEGORY_NAMES[plan.category]}
          {plan.motorised ? ' · motorised' : ''}
        </Text>
        <Heading as="h2" size="md" fontWeight="600">
          <Link asChild color="walnut.700">
            <RouterLink to={href}>{plan.title}</RouterLink>
          </Link>
        </Heading>
        <Text fontSize="sm" color="fg.muted">
          by {plan.designer.displayName}
          {plan.latestRevision ? ` · r${plan.latestRevision.number}` : ''}
        </Text>
        <Text fontSize="sm" lineClamp={2}>
          {plan.summary}
        </Text>
        <Flex gap="3" fontSize="sm" color="fg.muted" flexWrap="wrap" className="numeric">
          <Text>{ratingText(plan.rating)}</Text>
          <Text>{buildCountText(plan.buildCount)}</Text>
        </Flex>
      </Stack>
    </Box>
  );
}
