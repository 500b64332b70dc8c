import { Avatar, Button, Menu, Portal, Text } from '@chakra-ui/react';
import { useNavigate } from 'react-router';
import { paths } from '../../../config/paths';
import type { Member } from '../api/get-me';
import { useSignOut } from '../api/sign-out';
import { isAdmin } from '../roles';

export function MemberMenu({ member }: { member: Member }) {
  const navigate = useNavigate();
  const signOut = useSignOut();
  return (
    <Menu.Root positioning={{ placement: 'bottom-end' }}>
      <Menu.Trigger asChild>
        <Button variant="ghost" size="sm" aria-label={`Member menu for ${member.displayName}`} gap="2" px="2">
          <Avatar.Root size="xs">
            <Avatar.Fallback name={member.displayName} />
            {member.avatarUrl && <Avatar.Image src={member.avatarUrl} alt="" />}
          </Avatar.Root>
          <Text as="span" fontWeight="500" data-testid="member-name">
            {member.displayName}
          </Text>
        </Button>
      </Menu.Trigger>
      <Portal>
        <Menu.Positioner>
          <Menu.Content minW="44">
            <Menu.Item value="workshop" onClick={() => navigate(paths.workshop.getHref())}>
              My workshop
            </Menu.Item>
            <Menu.Item value="new-plan" onClick={() => navigate(paths.newPlan.getHref())}>
              New plan
            </Menu.Item>
            <Menu.Item value="profile" onClick={() => navigate(paths.memberProfile.getHref(member.login))}>
              My profile
            </Menu.Item>
            <Menu.Item value="settings" onClick={() => navigate(paths.settings.getHref())}>
              Settings
            </Menu.Item>
            {isAdmin(member) && (
              <Menu.Item value="members" onClick={() => navigate(paths.members.getHref())}>
                Members
              </Menu.Item>
            )}
            <Menu.Separator />
            <Menu.Item
              value="sign-out"
              onClick={() => signOut.mutate(undefined, { onSuccess: () => navigate(paths.library.getHref()) })}
            >
              Sign out
            </Menu.Item>
          </Menu.Content>
        </Menu.Positioner>
      </Portal>
    </Menu.Root>
  );
}
