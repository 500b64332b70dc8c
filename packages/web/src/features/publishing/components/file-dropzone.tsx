import { Box, Button, HStack, Progress, Stack, Text } from '@chakra-ui/react';
import { useDropzone, type Accept } from 'react-dropzone';
import { formatBytes, percentSent, type UploadItem } from '../upload-queue';

/** The drop area: drag files onto it or pick them; several at once. */
export function FileDropzone({
  label,
  hint,
  accept,
  disabled = false,
  onFiles,
}: {
  label: string;
  hint: string;
  accept?: Accept;
  disabled?: boolean;
  onFiles(files: File[]): void;
}) {
  // Refused files go through the same queue as the others, to show each one's reason.
  const { getRootProps, getInputProps, isDragActive, open } = useDropzone({
    accept,
    disabled,
    multiple: true,
    noClick: true,
    noKeyboard: true,
    onDrop: (accepted, rejected, event) => {
      onFiles([...accepted, ...rejected.map((rejection) => rejection.file)]);
      // Emptied, so that picking the same file again is a change too (and is told it is a duplicate).
      if (event?.target instanceof HTMLInputElement) event.target.value = '';
    },
  });
  return (
    <Box
      {...getRootProps()}
      borderWidth="2px"
      borderStyle="dashed"
      borderColor={isDragActive ? 'steel.600' : 'border'}
      bg={isDragActive ? 'steel.50' : 'birch'}
      borderRadius="lg"
      px="4"
      py="6"
      textAlign="center"
      transition="background 0.15s, border-color 0.15s"
      opacity={disabled ? 0.6 : 1}
    >
      {/* The button below opens it; the field itself stays out of the way of assistive technology. */}
      <input {...getInputProps()} aria-hidden="true" />
      <Text fontWeight="500">{isDragActive ? 'Drop the files to upload them' : 'Drag files here, or'}</Text>
      <Button mt="2" size="sm" colorPalette="steel" variant="outline" onClick={open} disabled={disabled}>
        {label}
      </Button>
      <Text mt="2" fontSize="sm" color="fg.muted">
        {hint}
      </Text>
    </Box>
  );
}

/** Each file on its way, with its progress and Cancel, or its reason for failing and Dismiss. */
export function UploadList({
  items,
  onCancel,
  onDismiss,
}: {
  items: readonly UploadItem[];
  onCancel(key: string): void;
  onDismiss(key: string): void;
}) {
  if (items.length === 0) return null;
  return (
    <Stack as="ul" gap="2" aria-label="Uploads" listStyleType="none">
      {items.map((item) => (
        <Box
          as="li"
          key={item.key}
          aria-label={item.name}
          borderWidth="1px"
          borderColor={item.phase === 'failed' ? 'brick.600' : 'border'}
          borderRadius="md"
          px="3"
          py="2"
          bg="bg.panel"
        >
          <HStack justify="space-between" gap="3" align="flex-start">
            <Box minW="0" flex="1">
              <Text fontWeight="500" truncate title={item.name}>
                {item.name}
              </Text>
              {item.phase === 'failed' ? (
                <Text role="alert" color="brick.700" fontSize="sm">
                  {item.message}
                </Text>
              ) : (
                <>
                  <Progress.Root mt="1" size="sm" colorPalette="steel" value={percentSent(item)} max={100}>
                    <Progress.Track aria-label={`Upload of ${item.name}`}>
                      <Progress.Range />
                    </Progress.Track>
                  </Progress.Root>
                  <Text mt="1" fontSize="sm" color="fg.muted" className="numeric">
                    {item.cancelling
                      ? 'Cancelling: removing what the server already received…'
                      : item.phase === 'checking'
                        ? 'Sent; the server is checking and storing it…'
                        : `${percentSent(item)} % of ${formatBytes(item.size)}`}
                  </Text>
                </>
              )}
            </Box>
            {item.phase === 'failed' ? (
              <Button size="xs" variant="ghost" onClick={() => onDismiss(item.key)} aria-label={`Dismiss ${item.name}`}>
                Dismiss
              </Button>
            ) : (
              <Button
                size="xs"
                variant="outline"
                colorPalette="brick"
                disabled={item.cancelling}
                onClick={() => onCancel(item.key)}
                aria-label={`Cancel the upload of ${item.name}`}
              >
                Cancel
              </Button>
            )}
          </HStack>
        </Box>
      ))}
    </Stack>
  );
}
