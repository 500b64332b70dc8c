import { Box, Button, Code, Heading, Text } from '@chakra-ui/react';
import { isRouteErrorResponse, Link as RouterLink, useRouteError } from 'react-router';
import { paths } from '../../config/paths';
import { ApiError } from '../../lib/api-client';

/** Shown when a route fails to load or throws while rendering. */
export function RouteErrorBoundary() {
  const error = useRouteError();
  const status = isRouteErrorResponse(error) ? error.status : error instanceof ApiError ? error.status : undefined;
  const message = isRouteErrorResponse(error)
    ? typeof error.data === 'string'
      ? error.data
      : error.statusText
    : error instanceof Error
      ? error.message
      : 'Something went wrong.';
  return (
    <Box
      role="alert"
      bg="bg.panel"
      borderWidth="1px"
      borderColor="brick.200"
      borderLeftWidth="4px"
      borderLeftColor="brick.600"
      borderRadius="md"
      p="6"
      maxW="3xl"
      m="8"
    >
      <Heading as="h1" size="lg" color="brick.700">
        {status === 404 ? 'Not found' : status === 403 ? 'Not open to you' : 'This page could not be shown'}
      </Heading>
      <Text mt="2">
        {status === 403
          ? 'Your account does not have the role this page needs.'
          : 'Nothing you saved is lost. Try again, or go back to the library.'}
      </Text>
      <Code mt="3" display="block" whiteSpace="pre-wrap" p="2" bg="brick.50" color="graphite">
        {status ? `${status} · ` : ''}
        {message}
      </Code>
      <Box mt="4" display="flex" gap="3">
        <Button onClick={() => window.location.reload()} colorPalette="steel">
          Try again
        </Button>
        <Button asChild variant="outline">
          <RouterLink to={paths.library.getHref()}>Go to the library</RouterLink>
        </Button>
      </Box>
    </Box>
  );
}
