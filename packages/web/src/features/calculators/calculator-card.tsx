import { Card, Link } from '@chakra-ui/react';
import { Link as RouterLink } from 'react-router';
import type { CalculatorEntry } from './registry';

export function CalculatorCard({ calculator }: { calculator: CalculatorEntry }) {
  return (
    <Card.Root variant="outline" bg="bg.panel">
      <Card.Body>
        <Card.Title>
          <Link asChild color="steel.700">
            <RouterLink to={calculator.href}>{calculator.title}</RouterLink>
          </Link>
        </Card.Title>
        <Card.Description color="fg.muted">{calculator.summary}</Card.Description>
      </Card.Body>
    </Card.Root>
  );
}
