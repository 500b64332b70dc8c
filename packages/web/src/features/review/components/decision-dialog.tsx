import { Button, Dialog, Field, Portal, Text, Textarea } from '@chakra-ui/react';
import { useId, useState } from 'react';
import { DECISIONS } from '../wording';
import type { DecisionState, PendingDecision } from './use-decision';

/** The dialog's content for one decision; a new decision mounts it afresh, with an empty notes box. */
function DecisionForm({ decision, pending }: { decision: DecisionState; pending: PendingDecision }) {
  const [text, setText] = useState('');
  const [missing, setMissing] = useState(false);
  const notesId = useId();
  const wording = DECISIONS[pending.decision];

  const confirm = () => {
    if (wording.notesRequired && text.trim() === '') {
      setMissing(true);
      return;
    }
    decision.confirm(text);
  };

  return (
    <>
      <Dialog.Header>
        <Dialog.Title color="walnut.700">{wording.title(pending.what)}</Dialog.Title>
      </Dialog.Header>
      <Dialog.Body>
        <Text mb="4">{wording.body}</Text>
        <Field.Root required={wording.notesRequired} invalid={missing}>
          <Field.Label htmlFor={notesId}>
            {wording.notesLabel}
            {wording.notesRequired && <Field.RequiredIndicator />}
          </Field.Label>
          <Textarea
            id={notesId}
            value={text}
            rows={6}
            maxLength={5000}
            bg="white"
            onChange={(event) => {
              setText(event.target.value);
              if (event.target.value.trim()) setMissing(false);
            }}
          />
          <Field.ErrorText>{wording.missingNotes}</Field.ErrorText>
        </Field.Root>
        {decision.error && (
          <Text role="alert" mt="3" color="brick.700">
            Nothing was decided: {decision.error}
          </Text>
        )}
        <Text mt="3" color="fg.muted" fontSize="sm">
          The decision is e-mailed to the designer and kept in the audit log.
        </Text>
      </Dialog.Body>
      <Dialog.Footer>
        <Dialog.ActionTrigger asChild>
          <Button variant="outline" disabled={decision.busy}>
            Cancel
          </Button>
        </Dialog.ActionTrigger>
        <Button colorPalette={wording.destructive ? 'brick' : 'steel'} loading={decision.busy} onClick={confirm}>
          {wording.confirm}
        </Button>
      </Dialog.Footer>
    </>
  );
}

/**
 * Every decision is confirmed here, with the notes the designer will read; send back, decline and
 * hide cannot go without them. The notes typed stay in the box when the server refuses.
 */
export function DecisionDialog({ decision }: { decision: DecisionState }) {
  const { pending } = decision;
  return (
    <Dialog.Root
      open={pending !== null}
      onOpenChange={({ open }) => !open && decision.cancel()}
      placement="center"
      size="lg"
    >
      <Portal>
        <Dialog.Backdrop />
        <Dialog.Positioner>
          <Dialog.Content>
            {pending && (
              <DecisionForm key={`${pending.decision} ${pending.what}`} decision={decision} pending={pending} />
            )}
          </Dialog.Content>
        </Dialog.Positioner>
      </Portal>
    </Dialog.Root>
  );
}
