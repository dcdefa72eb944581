import js from '@eslint/js';
import prettier from 'eslint-config-prettier';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

/** Import direction (style.md §8): src never reaches into server; shared stays framework-free. */
const restrict = (patterns) => ({
  'no-restricted-imports': ['error', { patterns }],
});

const noClientCode = {
  group: ['**/src/**', '@/*', 'react', 'react-dom'],
  message: 'The server never imports client code.',
};

/** Data layer (DEVELOPERS.md): presenters shape answers, so only routes call them. */
const presentersFromRoutesOnly = {
  group: ['**/presenters/*', '**/presenters'],
  message: 'Presenters are called by routes only: return records and let the route present.',
};

/** Services that still import presenters, each to move (named in DEVELOPERS.md). */
const SERVICES_STILL_PRESENTING = [
  'server/services/people/users.ts',
  'server/services/people/invitations.ts',
  'server/services/report/build-report.ts',
  'server/services/prints/list-prints.ts',
  'server/services/prints/print-command.ts',
  'server/services/tone/import-cgats.ts',
  'server/services/tone/read-tone.ts',
  'server/services/tone/tone-checks.ts',
];

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
      // Cache keys come from a factory (src/lib/catalogue for prints), never typed inline.
      'no-restricted-syntax': [
        'error',
        {
          selector:
            "CallExpression[callee.property.name=/^(invalidate|remove|refetch)Queries$/] Property[key.name='queryKey'] > ArrayExpression",
          message: 'Invalidate through a key factory; for prints, use invalidateCatalogue.',
        },
        {
          // Measured in Chromium: the first Intl.DateTimeFormat took 23–35 ms (150–180 ms at the
          // 4x CPU slowdown of a phone profile), paid while the module loads, whether or not
          // the page formats anything. Dates go through shared/domain/format.ts.
          selector:
            ":matches(Program, ExportNamedDeclaration) > VariableDeclaration > VariableDeclarator > NewExpression[callee.object.name='Intl']",
          message:
            'No Intl formatter made at module load (tens of ms on a phone); use shared/domain/format.ts or make it when first needed.',
        },
      ],
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
    rules: restrict([noClientCode, presentersFromRoutesOnly]),
  },
  {
    // Presenters may import each other; until they move, these services still present
    // (audit snapshots and composed views): see DEVELOPERS.md, "Data layer".
    files: ['server/presenters/**/*.ts', ...SERVICES_STILL_PRESENTING],
    rules: restrict([noClientCode]),
  },
  {
    // Routes are thin: they call services and presenters, never the ORM or a repository.
    files: ['server/routes/**/*.ts'],
    rules: restrict([
      noClientCode,
      {
        group: ['**/models', '**/models/*', 'sequelize', 'sequelize/*'],
        message: 'Routes do not touch models or Sequelize: call a service.',
      },
      {
        group: ['**/repositories/*', '**/repositories'],
        message: 'Routes call services; services call repositories.',
      },
    ]),
  },
  prettier,
);
