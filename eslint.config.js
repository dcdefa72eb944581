import js from '@eslint/js';
import prettier from 'eslint-config-prettier';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

/** Import direction (style.md §8): src never reaches into server; shared stays framework-free. */
const restrict = (patterns) => ({
  'no-restricted-imports': ['error', { patterns }],
});

export default tseslint.config(
  {
    ignores: [
      'dist',
      'node_modules',
      'data',
      'uploads',
      'bench/results',
      'coverage',
      '.scratch',
      '.tmp',
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    rules: {
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', destructuredArrayIgnorePattern: '^_' },
      ],
      '@typescript-eslint/consistent-type-imports': ['error', { fixStyle: 'inline-type-imports' }],
    },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    rules: {
      ...reactHooks.configs.recommended.rules,
      ...restrict([
        {
          group: ['**/server/**', '../server/*'],
          message: 'The client never imports server code.',
        },
        { group: ['sequelize', 'express', 'sharp'], message: 'Server-only package.' },
      ]),
    },
  },
  {
    // Features do not import each other; shared UI lives in src/components and src/lib.
    files: ['src/features/*/**/*.{ts,tsx}'],
    rules: restrict([
      { group: ['**/server/**'], message: 'The client never imports server code.' },
      {
        group: ['@/features/*', '../../features/*', '../../*/api/*'],
        message:
          'Features do not import each other; move shared parts to src/components or src/lib.',
      },
    ]),
  },
  {
    files: ['shared/**/*.ts'],
    rules: restrict([
      {
        group: [
          'react',
          'react-*',
          '@tanstack/*',
          'sequelize',
          'express',
          '**/server/**',
          '**/src/**',
          '@/*',
        ],
        message: 'shared/ is pure: no React, no Sequelize, no server or client code.',
      },
    ]),
  },
  {
    files: ['server/**/*.ts'],
    rules: restrict([
      {
        group: ['**/src/**', '@/*', 'react', 'react-dom'],
        message: 'The server never imports client code.',
      },
    ]),
  },
  prettier,
);
