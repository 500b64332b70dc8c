import { Box, Button, HStack, Image, Link, Spinner, Stack, Text } from '@chakra-ui/react';
import { useQuery } from '@tanstack/react-query';
import { lazy, Suspense, useState } from 'react';
import { apiText } from '../../../lib/api-client';
import type { Attachment } from '../api/types';
import { attachmentViewOf, type CodeLanguage } from '../attachment-kind';

const CodeView = lazy(() => import('./code-view'));

function sizeText(bytes: number): string {
  return bytes < 1024
    ? `${bytes} B`
    : bytes < 1024 * 1024
      ? `${(bytes / 1024).toFixed(1)} kB`
      : `${(bytes / 1024 / 1024).toFixed(1)} MB`;
}

function AttachmentText({ attachment, language }: { attachment: Attachment; language: CodeLanguage }) {
  const text = useQuery({
    queryKey: ['attachments', attachment.downloadUrl],
    queryFn: () => apiText(attachment.downloadUrl.replace(/^\/api/, '')),
    staleTime: Infinity,
  });
  if (text.isPending) return <Spinner size="sm" aria-label={`Loading ${attachment.name}`} />;
  if (text.isError)
    return (
      <Text color="brick.700" role="alert">
        {attachment.name} could not be loaded: {text.error.message}
      </Text>
    );
  return (
    <Suspense fallback={<Spinner size="sm" aria-label={`Loading ${attachment.name}`} />}>
      <CodeView text={text.data} language={language} label={`Contents of ${attachment.name}`} />
    </Suspense>
  );
}

function AttachmentItem({ attachment }: { attachment: Attachment }) {
  const view = attachmentViewOf(attachment);
  const [open, setOpen] = useState(false);
  return (
    <Stack as="li" gap="2">
      <HStack gap="3" wrap="wrap">
        <Link href={attachment.downloadUrl} download={attachment.name} color="steel.700" fontWeight="500">
          Download {attachment.name}
        </Link>
        <Text as="span" color="fg.muted" fontSize="sm" className="numeric">
          ({sizeText(attachment.size)}){attachment.description ? ` · ${attachment.description}` : ''}
        </Text>
        {view.kind === 'code' && (
          <Button size="xs" variant="outline" aria-expanded={open} onClick={() => setOpen((was) => !was)}>
            {open ? 'Hide the code' : 'Show the code'}
          </Button>
        )}
      </HStack>
      {view.kind === 'code' && open && <AttachmentText attachment={attachment} language={view.language} />}
      {view.kind === 'image' && (
        <Box maxW="20rem">
          <Image
            src={attachment.downloadUrl}
            alt={attachment.description || attachment.name}
            loading="lazy"
            borderRadius="md"
            borderWidth="1px"
            borderColor="walnut.100"
          />
        </Box>
      )}
    </Stack>
  );
}

/** The revision's attachments: every one downloadable, code opened in place with highlighting, images shown. */
export function AttachmentsList({ attachments }: { attachments: readonly Attachment[] }) {
  if (attachments.length === 0) return <Text color="fg.muted">No attachments on this revision.</Text>;
  return (
    <Stack as="ul" gap="4" listStyleType="none" ps="0">
      {attachments.map((attachment) => (
        <AttachmentItem key={attachment.id} attachment={attachment} />
      ))}
    </Stack>
  );
}
