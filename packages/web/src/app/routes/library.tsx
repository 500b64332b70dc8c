import { Button, Text } from '@chakra-ui/react';
import { Link as RouterLink } from 'react-router';
import { EmptyState, Page } from '../../components/page';
import { paths } from '../../config/paths';

export default function LibraryRoute() {
  return (
    <Page
      title="Plan library"
      lead="Shop-jig plans from woodworkers who built them: sleds, fences, taper and circle jigs, drilling guides and motorised indexing jigs, each with a cut list measured from its drawing."
    >
      <EmptyState title="No plans have been published yet">
        <Text>Published plans appear here once a moderator has reviewed them.</Text>
        <Button asChild mt="4" variant="outline" colorPalette="steel">
          <RouterLink to={paths.calculators.getHref()}>Open the calculators meanwhile</RouterLink>
        </Button>
      </EmptyState>
    </Page>
  );
}
