import { List } from '@chakra-ui/react';
import { CautionFrame } from '../../../components/caution-frame';
import { withoutRepeatedTitle } from '../notes-title';
import { NotesMarkdown } from './notes-markdown';

/** The plan's safety notes, always open: the designer's notes first, then the usual cautions the plan calls for. */
export function SafetyPanel({ notes, cautions }: { notes: string; cautions: readonly string[] }) {
  const text = withoutRepeatedTitle(notes, ['Safety notes', 'Safety']);
  return (
    <CautionFrame title="Safety notes">
      {text.trim() && <NotesMarkdown text={text} />}
      {cautions.length > 0 && (
        <List.Root mt="2" gap="1" ps="4" aria-label="Usual cautions">
          {cautions.map((point) => (
            <List.Item key={point}>{point}</List.Item>
          ))}
        </List.Root>
      )}
    </CautionFrame>
  );
}
