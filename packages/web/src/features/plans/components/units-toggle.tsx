import { Button, HStack } from '@chakra-ui/react';
import type { Units } from '../units';

/** Millimetres or inches for every measurement on the page. */
export function UnitsToggle({ units, onChange }: { units: Units; onChange: (units: Units) => void }) {
  return (
    <HStack gap="0" role="group" aria-label="Units">
      {(['mm', 'in'] as const).map((option) => (
        <Button
          key={option}
          size="sm"
          variant={option === units ? 'solid' : 'outline'}
          colorPalette="steel"
          aria-pressed={option === units}
          borderRadius={option === 'mm' ? 'md 0 0 md' : '0 md md 0'}
          onClick={() => onChange(option)}
        >
          {option === 'mm' ? 'Millimetres' : 'Inches'}
        </Button>
      ))}
    </HStack>
  );
}
