import { Box } from '@chakra-ui/react';
import { toJsxRuntime } from 'hast-util-to-jsx-runtime';
import arduino from 'highlight.js/lib/languages/arduino';
import c from 'highlight.js/lib/languages/c';
import cpp from 'highlight.js/lib/languages/cpp';
import gcode from 'highlight.js/lib/languages/gcode';
import javascript from 'highlight.js/lib/languages/javascript';
import json from 'highlight.js/lib/languages/json';
import markdown from 'highlight.js/lib/languages/markdown';
import plaintext from 'highlight.js/lib/languages/plaintext';
import python from 'highlight.js/lib/languages/python';
import typescript from 'highlight.js/lib/languages/typescript';
import yaml from 'highlight.js/lib/languages/yaml';
import { createLowlight } from 'lowlight';
import { useMemo } from 'react';
import { Fragment, jsx, jsxs } from 'react/jsx-runtime';
import type { CodeLanguage } from '../attachment-kind';

const grammars: Record<CodeLanguage, Parameters<ReturnType<typeof createLowlight>['register']>[1]> = {
  arduino,
  c,
  cpp,
  gcode,
  javascript,
  json,
  markdown,
  plaintext,
  python,
  typescript,
  yaml,
};
const lowlight = createLowlight(grammars);

// Our palette on white: every colour here meets WCAG AA (4.5:1) for normal text.
const tokenColours = {
  '& .hljs-comment, & .hljs-quote': { color: 'sage.700', fontStyle: 'italic' },
  '& .hljs-keyword, & .hljs-selector-tag, & .hljs-meta, & .hljs-built_in': { color: 'walnut.600', fontWeight: '600' },
  '& .hljs-string, & .hljs-attr, & .hljs-template-variable': { color: 'steel.700' },
  '& .hljs-number, & .hljs-literal, & .hljs-symbol': { color: 'brick.700' },
  '& .hljs-title, & .hljs-section, & .hljs-name, & .hljs-type': { color: 'steel.800', fontWeight: '600' },
  '& .hljs-variable, & .hljs-params': { color: 'graphite' },
};

/**
 * An attachment's text with syntax highlighting, in a chunk of its own loaded when a file is opened.
 * lowlight gives a syntax tree that React renders as elements, so no HTML string is ever injected.
 */
export default function CodeView({ text, language, label }: { text: string; language: CodeLanguage; label: string }) {
  const content = useMemo(
    () => toJsxRuntime(lowlight.highlight(language, text), { Fragment, jsx, jsxs }),
    [language, text],
  );
  const lineCount = text.split('\n').length;
  return (
    <Box
      as="pre"
      aria-label={label}
      tabIndex={0}
      bg="white"
      borderWidth="1px"
      borderColor="walnut.100"
      borderRadius="md"
      p="3"
      maxH="28rem"
      overflow="auto"
      fontSize="sm"
      lineHeight="1.5"
      fontFamily="ui-monospace, SFMono-Regular, Menlo, Consolas, monospace"
      css={tokenColours}
      data-lines={lineCount}
    >
      <code className={`hljs language-${language}`}>{content}</code>
    </Box>
  );
}
