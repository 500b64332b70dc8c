import { Button, Heading, Stack, Text } from '@chakra-ui/react';
import type { QueryClient } from '@tanstack/react-query';
import { data, Link as RouterLink, useParams, type LoaderFunctionArgs } from 'react-router';
import { EmptyState, Page } from '../../components/page';
import { paths } from '../../config/paths';
import { useMe } from '../../features/auth/api/get-me';
import { profileQueryOptions, useProfile } from '../../features/members/api/get-profile';
import { ProfileCard } from '../../features/members/components/profile-card';
import { ApiError } from '../../lib/api-client';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    try {
      await queryClient.ensureQueryData(profileQueryOptions(params.login!));
    } catch (error) {
      if (error instanceof ApiError && error.status === 404)
        throw data(error.message, { status: 404, statusText: error.message });
      throw error;
    }
    return null;
  };

/** A section that later issues fill (plans, build reports); until then it says so plainly. */
function ProfileSection({
  id,
  title,
  empty,
  children,
}: {
  id: string;
  title: string;
  empty: string;
  children: string;
}) {
  return (
    <Stack as="section" gap="3" aria-labelledby={id}>
      <Heading as="h2" size="lg" id={id} color="walnut.700">
        {title}
      </Heading>
      <EmptyState title={empty}>
        <Text>{children}</Text>
      </EmptyState>
    </Stack>
  );
}

export default function MemberProfileRoute() {
  const login = useParams().login!;
  const { data: profile } = useProfile(login);
  const { data: me } = useMe();
  if (!profile) return null;
  const own = me?.login === profile.login;
  return (
    <Page title={profile.displayName}>
      <ProfileCard
        profile={profile}
        actions={
          own && (
            <Button asChild variant="outline" size="sm">
              <RouterLink to={paths.settings.getHref()}>Edit settings</RouterLink>
            </Button>
          )
        }
      />
      <ProfileSection
        id="published-plans"
        title="Published plans"
        empty={own ? 'You have not published a plan yet' : 'No published plans yet'}
      >
        {own
          ? 'Plans you publish after a moderator has reviewed them appear here for everyone to see.'
          : `Plans ${profile.displayName} publishes appear here once a moderator has reviewed them.`}
      </ProfileSection>
      <ProfileSection
        id="build-reports"
        title="Build reports"
        empty={own ? 'You have not reported a build yet' : 'No build reports yet'}
      >
        {own
          ? 'When you build a plan from the library, report how it went here: it helps the next builder.'
          : `Reports of how ${profile.displayName}'s builds went appear here.`}
      </ProfileSection>
    </Page>
  );
}
