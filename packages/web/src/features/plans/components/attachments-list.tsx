import { Link, List, Text } from '@chakra-ui/react';
import type { Attachment } from '../api/types';

function sizeText(bytes: number): string {
  return bytes < 1024
    ? `${bytes} B`
    : bytes < 1024 * 1024
      ? `${(bytes / 1024).toFixed(1)} kB`
      : `${(bytes / 1024 / 1024).toFixed(1)} MB`;
}

export function AttachmentsList({ attachments }: { attachments: readonly Attachment[] }) {
  if (attachments.length === 0) return <Text color="fg.muted">No attachments on this revision.</Text>;
  return (
    <List.Root gap="2" ps="0" listStyleType="none">
      {attachments.map((attachment) => (
        <List.Item key={attachment.id}>
          <Link href={attachment.downloadUrl} download={attachment.name} color="steel.700" fontWeight="500">
            Download {attachment.name}
          </Link>{' '}
          <Text as="span" color="fg.muted" fontSize="sm" className="numeric">
            ({sizeText(attachment.size)}){attachment.description ? ` · ${attachment.description}` : ''}
          </Text>
        </List.Item>
      ))}
    </List.Root>
  );
}
