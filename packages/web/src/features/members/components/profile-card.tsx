import { Avatar, Badge, Box, HStack, Text } from '@chakra-ui/react';
import type { ReactNode } from 'react';
import type { MemberProfile } from '../api/types';

const monthFormat = new Intl.DateTimeFormat('en-GB', { month: 'long', year: 'numeric' });

/** The member's avatar, login and standing; their name is the page's heading above it. */
export function ProfileCard({ profile, actions }: { profile: MemberProfile; actions?: ReactNode }) {
  return (
    <HStack gap="4" bg="bg.panel" borderWidth="1px" borderColor="border" borderRadius="lg" p="5" wrap="wrap">
      <Avatar.Root size="2xl">
        <Avatar.Fallback name={profile.displayName} />
        {profile.avatarUrl && <Avatar.Image src={profile.avatarUrl} alt="" />}
      </Avatar.Root>
      <Box flex="1" minW="48">
        <HStack gap="2" wrap="wrap">
          <Text color="fg.muted" fontSize="lg">
            @{profile.login} · member since {monthFormat.format(new Date(profile.memberSince))}
          </Text>
          {profile.role !== 'member' && (
            <Badge colorPalette={profile.role === 'admin' ? 'walnut' : 'steel'} variant="subtle">
              {profile.role === 'admin' ? 'Admin' : 'Moderator'}
            </Badge>
          )}
        </HStack>
      </Box>
      {actions}
    </HStack>
  );
}
