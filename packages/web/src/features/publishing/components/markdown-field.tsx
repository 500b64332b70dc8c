import { Box, Field, Tabs, Text, Textarea } from '@chakra-ui/react';
import { useState, type ReactNode } from 'react';

/** A Markdown text with Write and Preview; the preview is the plan page's own rendering, passed in. */
export function MarkdownField({
  label,
  helper,
  value,
  maxLength,
  rows = 10,
  readOnly,
  error,
  renderPreview,
  onChange,
}: {
  label: string;
  helper?: ReactNode;
  value: string;
  maxLength: number;
  rows?: number;
  readOnly: boolean;
  error?: string;
  renderPreview(text: string): ReactNode;
  onChange(value: string): void;
}) {
  const [tab, setTab] = useState('write');
  // Back to writing when the revision becomes editable again (withdrawn from review).
  const [wasReadOnly, setWasReadOnly] = useState(readOnly);
  if (wasReadOnly !== readOnly) {
    setWasReadOnly(readOnly);
    if (!readOnly) setTab('write');
  }
  const preview = (
    <Box borderWidth="1px" borderColor="border" borderRadius="md" p="4" minH="24" bg="bg.panel">
      {value.trim() === '' ? <Text color="fg.muted">Nothing written yet.</Text> : renderPreview(value)}
    </Box>
  );
  if (readOnly) return preview;
  return (
    <Field.Root invalid={Boolean(error)}>
      <Tabs.Root value={tab} onValueChange={({ value: next }) => setTab(next)} variant="line" size="sm" width="full">
        <Box display="flex" alignItems="flex-end" justifyContent="flex-end" gap="3" flexWrap="wrap">
          {/* The section's heading above says the same. */}
          <Field.Label srOnly>{label}</Field.Label>
          <Tabs.List aria-label={`${label}: write or preview`}>
            <Tabs.Trigger value="write">Write</Tabs.Trigger>
            <Tabs.Trigger value="preview">Preview</Tabs.Trigger>
          </Tabs.List>
        </Box>
        <Tabs.Content value="write" pt="2">
          <Textarea
            aria-label={label}
            value={value}
            rows={rows}
            maxLength={maxLength}
            onChange={(event) => onChange(event.target.value)}
            fontSize="sm"
            bg="bg.panel"
            autoresize={false}
          />
        </Tabs.Content>
        <Tabs.Content value="preview" pt="2">
          {preview}
        </Tabs.Content>
      </Tabs.Root>
      {error ? <Field.ErrorText>{error}</Field.ErrorText> : helper && <Field.HelperText>{helper}</Field.HelperText>}
      <Text fontSize="xs" color="fg.muted" alignSelf="flex-end" className="numeric">
        {value.length.toLocaleString('en')} / {maxLength.toLocaleString('en')}
      </Text>
    </Field.Root>
  );
}
