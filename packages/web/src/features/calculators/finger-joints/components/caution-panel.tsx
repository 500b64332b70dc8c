import { List, Text } from '@chakra-ui/react';
import type { Caution } from '@jigwright/core';
import { CautionFrame } from '../../../../components/caution-frame';

export function CautionPanel({ caution }: { caution: Caution }) {
  return (
    <CautionFrame title={caution.heading}>
      <List.Root mt="2" gap="1" ps="4">
        {caution.points.map((point) => (
          <List.Item key={point}>{point}</List.Item>
        ))}
      </List.Root>
      <Text mt="2" fontSize="sm" color="fg.muted">
        From {caution.sources.join('; ')}.
      </Text>
    </CautionFrame>
  );
}
