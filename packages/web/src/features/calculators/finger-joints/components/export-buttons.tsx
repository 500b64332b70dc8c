import { Button, Clipboard, Flex, Link, Stack, Text } from '@chakra-ui/react';
import type { JointPlan } from '@jigwright/core';
import { exportFiles, type ExportFile } from '../export-files';

function download(file: Extract<ExportFile, { ok: true }>) {
  const url = URL.createObjectURL(new Blob([file.text], { type: file.type }));
  const anchor = document.createElement('a');
  anchor.href = url;
  anchor.download = file.filename;
  anchor.click();
  // The browser reads the blob after the click returns.
  setTimeout(() => URL.revokeObjectURL(url));
}

export interface ExportButtonsProps {
  plan: JointPlan;
  /** The plan is the last good one while the inputs have a problem: its files would not match the form. */
  stale: boolean;
  /** The address of this page with the inputs in its query string. */
  shareHref: string;
}

export function ExportButtons({ plan, stale, shareHref }: ExportButtonsProps) {
  const files = exportFiles(plan);
  const reasons = files.flatMap((file) => (file.ok ? [] : [`${file.label}: ${file.reason}`]));
  return (
    <Stack gap="3">
      <Flex gap="2" wrap="wrap">
        {files.map((file) => (
          <Button
            key={file.id}
            size="sm"
            colorPalette="steel"
            variant={file.id === 'csv' ? 'solid' : 'outline'}
            disabled={stale || !file.ok}
            onClick={() => file.ok && download(file)}
          >
            Download {file.label}
          </Button>
        ))}
      </Flex>
      {stale && <Text color="fg.muted">Correct the marked inputs to download the files.</Text>}
      {reasons.map((reason) => (
        <Text key={reason} fontSize="sm" color="fg.muted">
          {reason}
        </Text>
      ))}
      <Flex gap="3" align="center" wrap="wrap">
        <Link href={shareHref} color="steel.700" fontWeight="500">
          Link to these inputs
        </Link>
        <Clipboard.Root value={new URL(shareHref, window.location.origin).href}>
          <Clipboard.Trigger asChild>
            <Button size="xs" variant="ghost" colorPalette="steel">
              <Clipboard.Indicator />
              <Clipboard.Context>{({ copied }) => (copied ? 'Copied' : 'Copy link')}</Clipboard.Context>
            </Button>
          </Clipboard.Trigger>
        </Clipboard.Root>
      </Flex>
    </Stack>
  );
}
