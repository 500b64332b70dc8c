import { ChakraProvider } from '@chakra-ui/react';
import { render } from '@testing-library/react';
import type { ReactElement } from 'react';
import { system } from '../../theme/system';

/** Renders one component with our theme, for component tests. */
export function renderWithTheme(element: ReactElement) {
  const result = render(<ChakraProvider value={system}>{element}</ChakraProvider>);
  return {
    ...result,
    rerender: (next: ReactElement) => result.rerender(<ChakraProvider value={system}>{next}</ChakraProvider>),
  };
}
