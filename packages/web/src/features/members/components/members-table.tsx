import { Avatar, Badge, Button, HStack, Link, Table, Text } from '@chakra-ui/react';
import { Link as RouterLink } from 'react-router';
import type { MemberChange } from '../api/change-member';
import type { AdminMember } from '../api/types';

const dateFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });

function RoleBadge({ role }: { role: AdminMember['role'] }) {
  if (role === 'member') return <Text as="span">Member</Text>;
  return (
    <Badge colorPalette={role === 'admin' ? 'walnut' : 'steel'} variant="subtle">
      {role === 'admin' ? 'Admin' : 'Moderator'}
    </Badge>
  );
}

function StatusBadge({ member }: { member: AdminMember }) {
  return member.suspended ? (
    <Badge colorPalette="brick" variant="subtle">
      Suspended
    </Badge>
  ) : (
    <Badge colorPalette="sage" variant="subtle">
      Active
    </Badge>
  );
}

/** Admins keep their role and cannot be suspended, so their row has no actions. */
function Actions({ member, onChange }: { member: AdminMember; onChange(change: MemberChange): void }) {
  if (member.role === 'admin') return <Text color="fg.muted">—</Text>;
  const name = member.displayName;
  return (
    <HStack gap="2" justify="flex-end" wrap="wrap">
      {member.role === 'moderator' ? (
        <Button
          size="xs"
          variant="outline"
          onClick={() => onChange('revoke-moderator')}
          aria-label={`Remove moderator role from ${name}`}
        >
          Remove moderator
        </Button>
      ) : (
        <Button
          size="xs"
          variant="outline"
          colorPalette="steel"
          onClick={() => onChange('grant-moderator')}
          aria-label={`Make ${name} a moderator`}
        >
          Make moderator
        </Button>
      )}
      {member.suspended ? (
        <Button
          size="xs"
          variant="outline"
          colorPalette="steel"
          onClick={() => onChange('restore')}
          aria-label={`Restore ${name}`}
        >
          Restore
        </Button>
      ) : (
        <Button
          size="xs"
          variant="outline"
          colorPalette="brick"
          onClick={() => onChange('suspend')}
          aria-label={`Suspend ${name}`}
        >
          Suspend
        </Button>
      )}
    </HStack>
  );
}

export function MembersTable({
  members,
  profileHref,
  onChange,
}: {
  members: AdminMember[];
  profileHref(login: string): string;
  onChange(member: AdminMember, change: MemberChange): void;
}) {
  return (
    <Table.ScrollArea borderWidth="1px" borderColor="border" borderRadius="lg" bg="bg.panel">
      <Table.Root size="sm" aria-label="Members">
        <Table.Header>
          <Table.Row>
            <Table.ColumnHeader>Member</Table.ColumnHeader>
            <Table.ColumnHeader>E-mail</Table.ColumnHeader>
            <Table.ColumnHeader>Role</Table.ColumnHeader>
            <Table.ColumnHeader>Status</Table.ColumnHeader>
            <Table.ColumnHeader textAlign="end">Joined</Table.ColumnHeader>
            <Table.ColumnHeader textAlign="end">Actions</Table.ColumnHeader>
          </Table.Row>
        </Table.Header>
        <Table.Body>
          {members.map((member) => (
            <Table.Row key={member.id} data-login={member.login}>
              <Table.Cell>
                <HStack gap="2">
                  <Avatar.Root size="xs">
                    <Avatar.Fallback name={member.displayName} />
                    {member.avatarUrl && <Avatar.Image src={member.avatarUrl} alt="" />}
                  </Avatar.Root>
                  <Link asChild color="steel.700">
                    <RouterLink to={profileHref(member.login)}>{member.displayName}</RouterLink>
                  </Link>
                  <Text as="span" color="fg.muted" fontSize="sm">
                    @{member.login}
                  </Text>
                </HStack>
              </Table.Cell>
              <Table.Cell>{member.email}</Table.Cell>
              <Table.Cell>
                <RoleBadge role={member.role} />
              </Table.Cell>
              <Table.Cell>
                <StatusBadge member={member} />
              </Table.Cell>
              <Table.Cell textAlign="end">{dateFormat.format(new Date(member.memberSince))}</Table.Cell>
              <Table.Cell textAlign="end">
                <Actions member={member} onChange={(change) => onChange(member, change)} />
              </Table.Cell>
            </Table.Row>
          ))}
        </Table.Body>
      </Table.Root>
    </Table.ScrollArea>
  );
}
