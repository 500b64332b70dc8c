import { Button, Dialog, Portal, Text } from '@chakra-ui/react';
import type { ReactNode } from 'react';

/** Asks before something that cannot be undone (removing a drawing, deleting a draft, leaving unsaved text). */
export function ConfirmDialog({
  open,
  title,
  children,
  confirm,
  cancel = 'Cancel',
  destructive = true,
  busy = false,
  error,
  onConfirm,
  onCancel,
}: {
  open: boolean;
  title: string;
  children: ReactNode;
  confirm: string;
  cancel?: string;
  destructive?: boolean;
  busy?: boolean;
  error?: string | null;
  onConfirm(): void;
  onCancel(): void;
}) {
  return (
    <Dialog.Root
      role="alertdialog"
      open={open}
      onOpenChange={({ open: next }) => !next && onCancel()}
      placement="center"
    >
      <Portal>
        <Dialog.Backdrop />
        <Dialog.Positioner>
          <Dialog.Content mx="4">
            <Dialog.Header>
              <Dialog.Title color="walnut.700">{title}</Dialog.Title>
            </Dialog.Header>
            <Dialog.Body>
              {children}
              {error && (
                <Text mt="3" role="alert" color="brick.700">
                  {error}
                </Text>
              )}
            </Dialog.Body>
            <Dialog.Footer>
              <Button variant="outline" disabled={busy} onClick={onCancel}>
                {cancel}
              </Button>
              <Button colorPalette={destructive ? 'brick' : 'steel'} loading={busy} onClick={onConfirm}>
                {confirm}
              </Button>
            </Dialog.Footer>
          </Dialog.Content>
        </Dialog.Positioner>
      </Portal>
    </Dialog.Root>
  );
}
