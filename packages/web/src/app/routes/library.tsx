import { Button, Flex, SimpleGrid, Text } from '@chakra-ui/react';
import type { QueryClient } from '@tanstack/react-query';
import { Link as RouterLink, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { EmptyState, Page } from '../../components/page';
import { paths } from '../../config/paths';
import { LIBRARY_PAGE_SIZE, plansQueryOptions, usePlans } from '../../features/plans/api/get-plans';
import { LibraryFilters } from '../../features/plans/components/library-filters';
import { PlanCard } from '../../features/plans/components/plan-card';
import {
  isNarrowed,
  libraryFilterFromSearch,
  librarySearchFromFilter,
  type LibraryFilter,
} from '../../features/plans/library-filter';

/**
 * Starts the search without waiting for it, so that a changed filter shows in the address at once
 * while the previous results stay on screen until the new ones arrive.
 */
export const clientLoader =
  (queryClient: QueryClient) =>
  ({ request }: LoaderFunctionArgs) => {
    void queryClient.prefetchQuery(plansQueryOptions(libraryFilterFromSearch(new URL(request.url).searchParams)));
    return null;
  };

const hrefOf = (filter: LibraryFilter) => {
  const search = librarySearchFromFilter(filter).toString();
  return search ? `${paths.library.getHref()}?${search}` : paths.library.getHref();
};

export default function LibraryRoute() {
  const [params, setParams] = useSearchParams();
  const filter = libraryFilterFromSearch(params);
  const plans = usePlans(filter);
  const total = plans.data?.total ?? 0;
  const pages = Math.max(1, Math.ceil(total / LIBRARY_PAGE_SIZE));
  const narrowed = isNarrowed(filter);

  return (
    <Page
      title="Plan library"
      lead="Shop-jig plans from woodworkers who built them: sleds, fences, taper and circle jigs, drilling guides and motorised indexing jigs, each with a cut list measured from its drawing."
    >
      <LibraryFilters filter={filter} onChange={(next) => setParams(librarySearchFromFilter(next))} />
      {plans.isError && (
        <Text role="alert" color="brick.700">
          The library could not be loaded: {plans.error.message}
        </Text>
      )}
      {plans.data && total === 0 && narrowed && (
        <EmptyState title="No plans match these filters">
          <Text>Try fewer filters or other words.</Text>
          <Button asChild mt="4" variant="outline" colorPalette="steel">
            <RouterLink to={paths.library.getHref()}>Clear the search and filters</RouterLink>
          </Button>
        </EmptyState>
      )}
      {plans.data && total === 0 && !narrowed && (
        <EmptyState title="No plans have been published yet">
          <Text>Published plans appear here once a moderator has reviewed them.</Text>
          <Button asChild mt="4" variant="outline" colorPalette="steel">
            <RouterLink to={paths.calculators.getHref()}>Open the calculators meanwhile</RouterLink>
          </Button>
        </EmptyState>
      )}
      {plans.data && total > 0 && (
        <>
          <Text color="fg.muted" aria-live="polite" className="numeric">
            {total} {total === 1 ? 'plan' : 'plans'}
            {pages > 1 ? ` · page ${filter.page} of ${pages}` : ''}
          </Text>
          <SimpleGrid columns={{ base: 1, sm: 2, lg: 3 }} gap="5" aria-busy={plans.isPlaceholderData}>
            {plans.data.items.map((plan) => (
              <PlanCard key={plan.slug} plan={plan} href={paths.plan.getHref(plan.slug)} />
            ))}
          </SimpleGrid>
          {pages > 1 && (
            <Flex as="nav" aria-label="Pages" gap="2" justify="center">
              {filter.page > 1 && (
                <Button asChild variant="outline" colorPalette="steel" size="sm">
                  <RouterLink to={hrefOf({ ...filter, page: filter.page - 1 })}>Previous page</RouterLink>
                </Button>
              )}
              {filter.page < pages && (
                <Button asChild variant="outline" colorPalette="steel" size="sm">
                  <RouterLink to={hrefOf({ ...filter, page: filter.page + 1 })}>Next page</RouterLink>
                </Button>
              )}
            </Flex>
          )}
        </>
      )}
    </Page>
  );
}
