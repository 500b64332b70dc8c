import { Box } from '@chakra-ui/react';
import Markdown, { type Components } from 'react-markdown';

// The page already has its h1 (the plan) and h2 (each section): a designer's headings sit below them.
const shiftedHeadings: Components = {
  h1: ({ children }) => <h3>{children}</h3>,
  h2: ({ children }) => <h4>{children}</h4>,
  h3: ({ children }) => <h5>{children}</h5>,
  h4: ({ children }) => <h6>{children}</h6>,
};

/** Markdown written by a designer; raw HTML in it is dropped, never rendered. */
export function NotesMarkdown({ text }: { text: string }) {
  return (
    <Box
      maxW="3xl"
      css={{
        '& h3, & h4, & h5, & h6': { color: 'walnut.700', fontWeight: '600', mt: '4', mb: '2' },
        '& h3': { fontSize: 'xl' },
        '& h4': { fontSize: 'lg' },
        '& h5, & h6': { fontSize: 'md' },
        '& p': { mb: '3' },
        '& ul, & ol': { ps: '6', mb: '3' },
        '& ul': { listStyleType: 'disc' },
        '& ol': { listStyleType: 'decimal' },
        '& a': { color: 'steel.700', textDecoration: 'underline' },
        '& code': { fontFamily: 'mono', fontSize: 'sm', bg: 'walnut.50', px: '1', borderRadius: 'sm' },
      }}
    >
      <Markdown skipHtml components={shiftedHeadings}>
        {text}
      </Markdown>
    </Box>
  );
}
