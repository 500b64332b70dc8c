import { SimpleGrid, Text } from '@chakra-ui/react';
import { EmptyState, Page } from '../../components/page';
import { calculators } from '../../features/calculators/registry';
import { CalculatorCard } from '../../features/calculators/calculator-card';

export default function CalculatorsRoute() {
  return (
    <Page title="Calculators" lead="Shop arithmetic done in your browser: nothing you type here is sent anywhere.">
      {calculators.length === 0 ? (
        <EmptyState title="No calculators yet">
          <Text>Calculators appear here as they are added.</Text>
        </EmptyState>
      ) : (
        <SimpleGrid columns={{ base: 1, md: 2 }} gap="4">
          {calculators.map((calculator) => (
            <CalculatorCard key={calculator.href} calculator={calculator} />
          ))}
        </SimpleGrid>
      )}
    </Page>
  );
}
