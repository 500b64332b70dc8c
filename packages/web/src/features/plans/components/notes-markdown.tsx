import { Box } from '@chakra-ui/react';
import Markdown from 'react-markdown';

/** Markdown written by a designer; raw HTML in it is dropped, never rendered. */
export function NotesMarkdown({ text }: { text: string }) {
  return (
    <Box
      maxW="3xl"
      css={{
        '& h1, & h2, & h3': { color: 'walnut.700', fontWeight: '600', mt: '4', mb: '2' },
        '& h1': { fontSize: 'xl' },
        '& h2': { fontSize: 'lg' },
        '& h3': { fontSize: 'md' },
        '& p': { mb: '3' },
        '& ul, & ol': { ps: '6', mb: '3' },
        '& ul': { listStyleType: 'disc' },
        '& ol': { listStyleType: 'decimal' },
        '& a': { color: 'steel.700', textDecoration: 'underline' },
        '& code': { fontFamily: 'mono', fontSize: 'sm', bg: 'walnut.50', px: '1', borderRadius: 'sm' },
      }}
    >
      <Markdown skipHtml>{text}</Markdown>
    </Box>
  );
}
