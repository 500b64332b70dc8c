import { Button, Text } from '@chakra-ui/react';
import { Link as RouterLink, useLocation } from 'react-router';
import { Page } from '../../components/page';
import { paths } from '../../config/paths';

export default function NotFoundRoute() {
  const location = useLocation();
  return (
    <Page
      title="Page not found"
      lead={`There is no page at ${location.pathname}. It may have moved, or the address has a typo.`}
    >
      <Text>
        <Button asChild colorPalette="steel">
          <RouterLink to={paths.library.getHref()}>Browse the plan library</RouterLink>
        </Button>
      </Text>
    </Page>
  );
}
