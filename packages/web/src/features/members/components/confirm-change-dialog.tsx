import { Button, Dialog, Portal, Text } from '@chakra-ui/react';
import type { MemberChange } from '../api/change-member';
import type { AdminMember } from '../api/types';

interface Wording {
  title: (name: string) => string;
  body: string;
  confirm: string;
  destructive: boolean;
}

const WORDING: Record<MemberChange, Wording> = {
  'grant-moderator': {
    title: (name) => `Make ${name} a moderator?`,
    body: 'They will see the review desk and can publish, send back and decline submitted revisions, and resolve flags.',
    confirm: 'Make moderator',
    destructive: false,
  },
  'revoke-moderator': {
    title: (name) => `Take the moderator role from ${name}?`,
    body: 'They keep their account, plans and build reports, but lose the review desk from their next page.',
    confirm: 'Remove moderator role',
    destructive: true,
  },
  suspend: {
    title: (name) => `Suspend ${name}?`,
    body: 'They are signed out everywhere at once. They can sign in again to read, but cannot publish, rate, report or change anything until restored.',
    confirm: 'Suspend member',
    destructive: true,
  },
  restore: {
    title: (name) => `Restore ${name}?`,
    body: 'They can publish, rate, report builds and change their settings again.',
    confirm: 'Restore member',
    destructive: false,
  },
};

export interface PendingChange {
  member: AdminMember;
  change: MemberChange;
}

/** Every change to a member is confirmed here first; the dialog names the member and what follows. */
export function ConfirmChangeDialog({
  pending,
  busy,
  onConfirm,
  onCancel,
}: {
  pending: PendingChange | null;
  busy: boolean;
  onConfirm(pending: PendingChange): void;
  onCancel(): void;
}) {
  const wording = pending ? WORDING[pending.change] : undefined;
  return (
    <Dialog.Root
      role="alertdialog"
      open={pending !== null}
      onOpenChange={({ open }) => !open && onCancel()}
      placement="center"
    >
      <Portal>
        <Dialog.Backdrop />
        <Dialog.Positioner>
          <Dialog.Content>
            {pending && wording && (
              <>
                <Dialog.Header>
                  <Dialog.Title color="walnut.700">{wording.title(pending.member.displayName)}</Dialog.Title>
                </Dialog.Header>
                <Dialog.Body>
                  <Text>{wording.body}</Text>
                  <Text mt="2" color="fg.muted" fontSize="sm">
                    @{pending.member.login} · The change is kept in the audit log.
                  </Text>
                </Dialog.Body>
                <Dialog.Footer>
                  <Dialog.ActionTrigger asChild>
                    <Button variant="outline" disabled={busy}>
                      Cancel
                    </Button>
                  </Dialog.ActionTrigger>
                  <Button
                    colorPalette={wording.destructive ? 'brick' : 'steel'}
                    loading={busy}
                    onClick={() => onConfirm(pending)}
                  >
                    {wording.confirm}
                  </Button>
                </Dialog.Footer>
              </>
            )}
          </Dialog.Content>
        </Dialog.Positioner>
      </Portal>
    </Dialog.Root>
  );
}
