import { Box, Button, List, Text } from '@chakra-ui/react';
import type { RevisionSummary } from '../api/types';

export function formatDate(iso: string | null): string {
  return iso
    ? new Date(iso).toLocaleDateString('en-GB', { day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' })
    : 'not published';
}

/** Every revision, newest first, with its changelog; choosing one shows it on the page. */
export function RevisionHistory({
  revisions,
  shown,
  onShow,
}: {
  revisions: readonly RevisionSummary[];
  shown: number;
  onShow: (number: number) => void;
}) {
  return (
    <List.Root gap="3" ps="0" listStyleType="none">
      {[...revisions].reverse().map((revision) => (
        <List.Item
          key={revision.number}
          borderLeftWidth="3px"
          borderColor={revision.number === shown ? 'steel.600' : 'border'}
          ps="3"
        >
          <Box display="flex" gap="3" alignItems="baseline" flexWrap="wrap">
            <Text fontWeight="600" className="numeric">
              r{revision.number}
            </Text>
            <Text color="fg.muted" fontSize="sm">
              {formatDate(revision.publishedAt)}
              {revision.state !== 'published' ? ` · ${revision.state.replace('-', ' ')}` : ''}
            </Text>
            {revision.number === shown ? (
              <Text fontSize="sm" color="fg.muted">
                shown above
              </Text>
            ) : (
              <Button size="xs" variant="outline" colorPalette="steel" onClick={() => onShow(revision.number)}>
                Show r{revision.number}
              </Button>
            )}
          </Box>
          <Text mt="1">{revision.changelog}</Text>
        </List.Item>
      ))}
    </List.Root>
  );
}
