import { Link } from '@chakra-ui/react';
import type { ReactNode } from 'react';
import { NavLink } from 'react-router';

/** A header navigation link that shows which section is open. */
export function HeaderNavLink({ to, children, end }: { to: string; children: ReactNode; end?: boolean }) {
  return (
    <Link
      asChild
      px="3"
      py="2"
      whiteSpace="nowrap"
      borderRadius="md"
      fontWeight="500"
      color="graphite"
      textDecoration="none"
      _hover={{ bg: 'walnut.50', textDecoration: 'none' }}
      css={{
        '&[aria-current=page]': { color: 'walnut.700', boxShadow: 'inset 0 -2px 0 0 var(--chakra-colors-walnut-600)' },
      }}
    >
      <NavLink to={to} end={end}>
        {children}
      </NavLink>
    </Link>
  );
}
