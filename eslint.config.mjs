import js from '@eslint/js';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

export default tseslint.config(
  { ignores: ['node_modules/', 'dist/', '.data/', '.expo/', 'artifacts/', 'test-results/', 'db/migrations/', 'expo-env.d.ts'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      'no-restricted-imports': ['error', { patterns: [{ group: ['../../*'], message: 'Use the @/ alias instead of deep relative paths.' }] }],
    },
  },
  {
    files: ['app/**/*.tsx', 'components/**/*.tsx', 'hooks/**/*.ts', 'hooks/**/*.tsx', 'lib/**/*.ts', 'lib/**/*.tsx'],
    plugins: { 'react-hooks': reactHooks },
    rules: { 'react-hooks/rules-of-hooks': 'error', 'react-hooks/exhaustive-deps': 'warn' },
  },
  {
    // The repo's shared/ is pure: no I/O and no environment.
    files: ['shared/**/*.ts'],
    rules: {
      'no-restricted-imports': ['error', { patterns: ['node:*', 'fs', 'path', 'pg', 'express', 'react', 'react-native', '@/server/*', '@/db/*'] }],
      'no-restricted-globals': ['error', 'process', 'fetch'],
    },
  },
);
