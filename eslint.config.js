import js from '@eslint/js';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

const restrict = (patterns, message) => ({
  'no-restricted-imports': ['error', { patterns: [{ group: patterns, message }] }],
});

export default tseslint.config(
  {
    ignores: [
      'dist',
      'node_modules',
      'drizzle',
      '.data',
      'test-results',
      'playwright-report',
      'coverage',
      'shared/fitting/wasm/assembly',
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/consistent-type-imports': 'error',
    },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'warn',
      ...restrict(
        ['**/server/**', '../server/*'],
        'The client never imports server code; share through shared/.',
      ),
    },
  },
  {
    // shared/ is imported by both sides and imports neither.
    files: ['shared/**/*.ts'],
    rules: restrict(['@/*', '**/src/**', '**/server/**'], 'shared/ imports nothing from src/ or server/.'),
  },
  {
    files: ['server/**/*.ts'],
    rules: restrict(['@/*', '**/src/**'], 'The server never imports client code.'),
  },
);
