import js from '@eslint/js';
import prettier from 'eslint-config-prettier';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

export default tseslint.config(
  {
    ignores: [
      '**/dist/**',
      '**/node_modules/**',
      '.data/**',
      '**/test-results/**',
      '**/playwright-report/**',
      'packages/core/fixtures/**',
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node } },
    rules: {
      '@typescript-eslint/no-explicit-any': 'error',
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', destructuredArrayIgnorePattern: '^_' },
      ],
      '@typescript-eslint/consistent-type-imports': [
        'error',
        { fixStyle: 'inline-type-imports', disallowTypeAnnotations: false },
      ],
    },
  },
  {
    files: ['packages/server/**/*.ts'],
    // NestJS injects by the constructor parameter's runtime type: those imports must stay value imports.
    rules: { '@typescript-eslint/consistent-type-imports': 'off' },
  },
  {
    files: ['packages/web/**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks },
    rules: reactHooks.configs.recommended.rules,
  },
  {
    files: ['**/*.cjs', 'packages/server/jest.config.js', 'packages/server/test/jest-e2e.config.js'],
    languageOptions: { sourceType: 'commonjs' },
    rules: { '@typescript-eslint/no-require-imports': 'off' },
  },
  // Features do not import each other: shared code lives in components/, lib/ and config/, composition in app/.
  ...[
    ['packages/web/src/features/*/*.{ts,tsx}', '^\\.\\./(?!\\.\\.)'],
    ['packages/web/src/features/*/*/*.{ts,tsx}', '^\\.\\./\\.\\./(?!\\.\\.)'],
  ].map(([files, regex]) => ({
    files: [files],
    rules: {
      'no-restricted-imports': [
        'error',
        { patterns: [{ regex, message: 'Features must not import other features.' }] },
      ],
    },
  })),
  prettier,
);
