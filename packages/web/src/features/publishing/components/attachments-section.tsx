import { Box, Button, HStack, Link, Stack, Text } from '@chakra-ui/react';
import { useState } from 'react';
import { ATTACHMENT_MAX_BYTES, deleteAttachment, uploadAttachment, useDeleteAttachment } from '../api/drawings';
import type { EditorAttachment, EditorRevision } from '../api/types';
import { formatBytes, tooLargeMessage } from '../upload-queue';
import { useRevisionUploads, type RevisionFiles } from '../use-revision-uploads';
import { ConfirmDialog } from './confirm-dialog';
import { EditorSection } from './editor-section';
import { FileDropzone, UploadList } from './file-dropzone';

const ATTACHMENT: RevisionFiles = {
  what: 'attachment',
  maxBytes: ATTACHMENT_MAX_BYTES,
  upload: uploadAttachment,
  remove: deleteAttachment,
  refuse: (file) => tooLargeMessage(file, ATTACHMENT),
};

/** Controller code, PDFs and pictures that go with the plan; the server knows them by their content. */
export function AttachmentsSection({ revision, readOnly }: { revision: EditorRevision; readOnly: boolean }) {
  const { planSlug: slug, number } = revision;
  const queue = useRevisionUploads(slug, number, ATTACHMENT);
  const removeAttachment = useDeleteAttachment(slug, number);
  const [removing, setRemoving] = useState<EditorAttachment | null>(null);

  return (
    <EditorSection
      title="Attachments"
      lead="Controller code and other text files, PDFs and images (PNG, JPEG, GIF, WebP), up to 8 MB each."
    >
      {!readOnly && (
        <FileDropzone
          label="Choose attachments"
          hint="Code such as .ino, .c, .py or G-code; PDFs; images."
          onFiles={queue.add}
        />
      )}
      <UploadList items={queue.items} onCancel={queue.cancel} onDismiss={queue.dismiss} />
      {revision.attachments.length === 0 ? (
        <Text color="fg.muted">No attachments.</Text>
      ) : (
        <Stack as="ul" gap="2" listStyleType="none" aria-label="Attachments on this revision">
          {revision.attachments.map((attachment) => (
            <Box
              as="li"
              key={attachment.id}
              borderWidth="1px"
              borderColor="border"
              borderRadius="md"
              p="3"
              aria-label={attachment.name}
            >
              <HStack justify="space-between" gap="3" wrap="wrap">
                <Box minW="0">
                  <Link href={attachment.downloadUrl} color="steel.700" fontWeight="500" wordBreak="break-all">
                    {attachment.name}
                  </Link>
                  <Text fontSize="sm" color="fg.muted" className="numeric">
                    {attachment.mediaType} · {formatBytes(attachment.size)}
                  </Text>
                </Box>
                {!readOnly && (
                  <Button size="xs" variant="outline" colorPalette="brick" onClick={() => setRemoving(attachment)}>
                    Remove
                  </Button>
                )}
              </HStack>
            </Box>
          ))}
        </Stack>
      )}
      {removeAttachment.error && (
        <Text role="alert" color="brick.700">
          {removeAttachment.error.message}
        </Text>
      )}
      <ConfirmDialog
        open={removing !== null}
        title={`Remove ${removing?.name ?? 'the attachment'}?`}
        confirm="Remove attachment"
        busy={removeAttachment.isPending}
        onCancel={() => setRemoving(null)}
        onConfirm={() => removing && removeAttachment.mutate(removing.id, { onSuccess: () => setRemoving(null) })}
      >
        <Text>The file is removed from this revision.</Text>
      </ConfirmDialog>
    </EditorSection>
  );
}
