import js from '@eslint/js';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

export default tseslint.config(
  { ignores: ['dist/', 'node_modules/', '.data/', 'coverage/'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    rules: {
      '@typescript-eslint/no-explicit-any': 'error',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/consistent-type-imports': ['error', { fixStyle: 'inline-type-imports' }],
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
    // shared/ is imported by both sides, so it may import neither side nor their frameworks.
    files: ['shared/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            { group: ['**/src/**', '@/*', '**/server/**'], message: 'shared/ must not import from src/ or server/.' },
            { group: ['react', 'react-*', 'react/*', '@tanstack/*'], message: 'shared/ must not import React.' },
            { group: ['express', 'express-*', 'passport*'], message: 'shared/ must not import Express.' },
            { group: ['typeorm', 'typeorm/*', 'pg', 'pg-*'], message: 'shared/ must not import TypeORM or pg.' },
          ],
        },
      ],
    },
  },
);
