import { Box, Button, Container, Flex, HStack, Link, Skeleton } from '@chakra-ui/react';
import { lazy, Suspense } from 'react';
import { Link as RouterLink, Outlet, useLocation, useNavigation } from 'react-router';
import { HeaderNavLink } from '../../components/nav-link';
import { paths } from '../../config/paths';
import { useMe } from '../../features/auth/api/get-me';
import { canReview } from '../../features/auth/roles';

// Only members see the menu: visitors' first page load does not carry its menu and popover code.
const MemberMenu = lazy(() =>
  import('../../features/auth/components/member-menu').then((m) => ({ default: m.MemberMenu })),
);

function Wordmark() {
  return (
    <Link
      asChild
      textDecoration="none"
      _hover={{ textDecoration: 'none' }}
      color="walnut.700"
      fontWeight="700"
      fontSize="xl"
      letterSpacing="-0.01em"
    >
      <RouterLink to={paths.library.getHref()} aria-label="Jigwright, the plan library">
        <svg width="26" height="26" viewBox="0 0 32 32" aria-hidden="true" style={{ marginRight: 8 }}>
          <rect width="32" height="32" rx="6" fill="#6B4329" />
          <path d="M7 9h18v4h-6v12h-4V13H9z" fill="none" stroke="#F5EEE2" strokeWidth="2" strokeLinejoin="round" />
        </svg>
        Jigwright
      </RouterLink>
    </Link>
  );
}

export function AppShell() {
  const me = useMe();
  const location = useLocation();
  const navigation = useNavigation();
  const member = me.data;
  return (
    <Box minH="100vh" display="flex" flexDirection="column">
      <Box as="header" bg="bg.panel" borderBottomWidth="1px" borderColor="border">
        <Container maxW="6xl" py="2">
          <Flex align="center" columnGap="6" rowGap="1" wrap="wrap">
            <Wordmark />
            {/* On a phone the links take their own row under the wordmark, scrolling sideways if they must. */}
            <HStack
              as="nav"
              aria-label="Main"
              gap="1"
              flex={{ base: '1 0 100%', md: '1' }}
              order={{ base: 2, md: 1 }}
              wrap="nowrap"
              overflowX="auto"
              mx={{ base: '-3', md: '0' }}
            >
              <HeaderNavLink to={paths.library.getHref()} end>
                Library
              </HeaderNavLink>
              <HeaderNavLink to={paths.calculators.getHref()}>Calculators</HeaderNavLink>
              {canReview(member) && <HeaderNavLink to={paths.reviewDesk.getHref()}>Review desk</HeaderNavLink>}
              {member && <HeaderNavLink to={paths.workshop.getHref()}>My workshop</HeaderNavLink>}
            </HStack>
            <Box order={{ base: 1, md: 2 }} ms="auto">
              {me.isPending ? (
                <Skeleton height="8" width="32" />
              ) : member ? (
                <Suspense fallback={<Skeleton height="8" width="32" />}>
                  <MemberMenu member={member} />
                </Suspense>
              ) : (
                <Button asChild size="sm" colorPalette="steel">
                  <RouterLink to={paths.signIn.getHref(location.pathname + location.search)}>Sign in</RouterLink>
                </Button>
              )}
            </Box>
          </Flex>
        </Container>
      </Box>
      <Box
        as="main"
        flex="1"
        py="8"
        opacity={navigation.state === 'loading' ? 0.6 : 1}
        transition="opacity 0.15s"
        aria-busy={navigation.state === 'loading'}
      >
        <Container maxW="6xl">
          <Suspense fallback={<Skeleton height="40" />}>
            <Outlet />
          </Suspense>
        </Container>
      </Box>
      <Box as="footer" borderTopWidth="1px" borderColor="border" py="4" fontSize="sm" color="fg.muted">
        <Container maxW="6xl">
          Jigwright — shop-jig plans shared by woodworkers. Plans are shared under the licence each designer chooses;
          build at your own risk and follow your tools' instructions and local codes.
        </Container>
      </Box>
    </Box>
  );
}
