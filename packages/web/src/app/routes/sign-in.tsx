import { Box, Button, Heading, Stack, Text } from '@chakra-ui/react';
import { Navigate, useSearchParams } from 'react-router';
import { signInStartHref } from '../../config/paths';
import { useMe } from '../../features/auth/api/get-me';

/** Messages for the failure codes the server's sign-in callback sends back. */
const FAILURES: Record<string, string> = {
  cancelled: 'The sign-in was cancelled at GitHub. Nothing was changed.',
  provider_error: 'GitHub reported a problem with the sign-in. Please try again in a moment.',
  state_mismatch:
    'The sign-in could not be verified: it may have been started in another tab or taken too long. Please start again.',
  token_rejected: 'GitHub did not accept the sign-in code. Please start again.',
  provider_unavailable: 'GitHub could not be reached to finish the sign-in. Please try again in a moment.',
  no_verified_email: 'Your GitHub account has no verified e-mail address. Verify one at GitHub, then sign in again.',
};

export default function SignInRoute() {
  const [params] = useSearchParams();
  const me = useMe();
  const returnTo = params.get('returnTo') ?? '/';
  const failure = params.get('error');
  if (me.data) return <Navigate to={returnTo} replace />;
  return (
    <Box maxW="md" mx="auto" mt="8" bg="bg.panel" borderWidth="1px" borderColor="border" borderRadius="lg" p="8">
      <Stack gap="4">
        <Heading as="h1" size="xl" color="walnut.700">
          Sign in to Jigwright
        </Heading>
        <Text color="fg.muted">
          Sign in with your GitHub account to publish plans, save adaptations, rate plans and report your builds.
          Reading the library needs no account.
        </Text>
        {failure && (
          <Box role="alert" borderLeftWidth="4px" borderColor="brick.600" bg="brick.50" p="3" borderRadius="sm">
            {FAILURES[failure] ?? 'The sign-in did not finish. Please try again.'}
          </Box>
        )}
        <Button asChild colorPalette="steel" size="lg">
          <a href={signInStartHref(returnTo)}>Continue with GitHub</a>
        </Button>
        <Text fontSize="sm" color="fg.muted">
          We keep your GitHub name, login, avatar and verified e-mail address, and nothing else from GitHub.
        </Text>
      </Stack>
    </Box>
  );
}
