import { DataList, Text } from '@chakra-ui/react';
import type { JointPlan } from '@jigwright/core';
import { driveFigures } from '../drive-figures';

export function DriveFiguresList({ plan }: { plan: JointPlan }) {
  const figures = driveFigures(plan);
  if (figures.length === 0) {
    return <Text color="fg.muted">Give the screw lead to get the steps of every pass and the drive's figures.</Text>;
  }
  return (
    <DataList.Root orientation="horizontal" size="md" aria-label="Drive figures">
      {figures.map((figure) => (
        <DataList.Item key={figure.label} alignItems="baseline">
          <DataList.ItemLabel minW="11rem" color="fg.muted">
            {figure.label}
          </DataList.ItemLabel>
          <DataList.ItemValue display="block">
            <Text as="span" className="numeric" fontWeight="500">
              {figure.value}
            </Text>
            {figure.note !== undefined && (
              <Text fontSize="sm" color="fg.muted">
                {figure.note}
              </Text>
            )}
          </DataList.ItemValue>
        </DataList.Item>
      ))}
    </DataList.Root>
  );
}
