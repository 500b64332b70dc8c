import { Avatar, Badge, Box, HStack, Text } from '@chakra-ui/react';
import type { ReactNode } from 'react';
import type { MemberProfile } from '../api/types';

const monthFormat = new Intl.DateTimeFormat('en-GB', { month: 'long', year: 'numeric' });

export function ProfileCard({ profile, actions }: { profile: MemberProfile; actions?: ReactNode }) {
  return (
    <HStack gap="4" bg="bg.panel" borderWidth="1px" borderColor="border" borderRadius="lg" p="5" wrap="wrap">
      <Avatar.Root size="2xl">
        <Avatar.Fallback name={profile.displayName} />
        {profile.avatarUrl && <Avatar.Image src={profile.avatarUrl} alt="" />}
      </Avatar.Root>
      <Box flex="1" minW="48">
        <HStack gap="2">
          <Text fontWeight="600" fontSize="xl">
            {profile.displayName}
          </Text>
          {profile.role !== 'member' && (
            <Badge colorPalette={profile.role === 'admin' ? 'walnut' : 'steel'} variant="subtle">
              {profile.role === 'admin' ? 'Admin' : 'Moderator'}
            </Badge>
          )}
        </HStack>
        <Text color="fg.muted">
          @{profile.login} · member since {monthFormat.format(new Date(profile.memberSince))}
        </Text>
      </Box>
      {actions}
    </HStack>
  );
}
