import { Box, Button, Flex, Heading, Stack, Text } from '@chakra-ui/react';
import type { JointPlan, SymmetrySuggestion } from '@jigwright/core';
import { formatLengthBoth } from '../format';

export interface LayoutNotesProps {
  plan: JointPlan;
  /** Takes a suggestion into the form; suggestions are never applied by themselves. */
  onApply: (suggestion: SymmetrySuggestion) => void;
}

function describe(suggestion: SymmetrySuggestion, plan: JointPlan): string {
  const change =
    suggestion.change === 'width'
      ? `Board width ${formatLengthBoth(suggestion.width, plan.units)}`
      : `Pin width ${formatLengthBoth(suggestion.pin, plan.units)}` +
        (suggestion.slot === suggestion.pin ? ' (slot the same)' : '');
  return `${change}: ${suggestion.pins} pins and ${suggestion.slots} slots on board A, a whole ${suggestion.edges} at both edges.`;
}

/** The core's warnings about the layout, and nearby widths that make it symmetric. */
export function LayoutNotes({ plan, onApply }: LayoutNotesProps) {
  if (plan.warnings.length === 0 && plan.symmetry.length === 0) return null;
  return (
    <Box borderWidth="1px" borderColor="steel.200" bg="steel.50" borderRadius="md" p="4" fontSize="sm">
      <Stack gap="2">
        <Heading as="h3" size="sm" color="steel.800" fontWeight="600">
          Symmetric widths
        </Heading>
        {plan.warnings.map((warning) => (
          <Text key={warning.code}>{warning.message}</Text>
        ))}
        {plan.symmetry.map((suggestion) => (
          <Flex key={`${suggestion.change}-${suggestion.width}-${suggestion.pin}`} gap="3" align="center" wrap="wrap">
            <Text flex="1" minW="16rem" className="numeric">
              {describe(suggestion, plan)}
            </Text>
            <Button size="xs" variant="outline" colorPalette="steel" bg="bg.panel" onClick={() => onApply(suggestion)}>
              Use {suggestion.change === 'width' ? 'this width' : 'this pin'}
            </Button>
          </Flex>
        ))}
      </Stack>
    </Box>
  );
}
