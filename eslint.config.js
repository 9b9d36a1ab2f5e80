import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';

export default tseslint.config(
  { ignores: ['dist', 'node_modules', '.data', 'test-artifacts', 'coverage', '**/.scratch'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/no-explicit-any': 'error',
    },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'error',
    },
  },
  {
    // One-way dependencies: shared code imports neither the client nor the server.
    files: ['src/shared/**/*.ts'],
    rules: {
      'no-restricted-imports': ['error', { patterns: ['../../server/*', '../app/*', '../features/*', '../components/*', '../lib/*'] }],
    },
  },
  {
    // The engines are pure: no database, no HTTP.
    files: ['server/costing/**/*.ts', 'server/derating/**/*.ts'],
    rules: {
      'no-restricted-imports': ['error', { paths: ['knex', 'pg', 'express', 'node:fs', 'node:http'] }],
    },
  },
);
