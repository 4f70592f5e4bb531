// Lint for the whole workspace: typescript-eslint strict, kebab-case file names, and import
// boundaries (packages never import apps; web features never import each other; the flow is
// components/lib -> features -> app).
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import boundaries from 'eslint-plugin-boundaries';
import checkFile from 'eslint-plugin-check-file';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import { createRequire } from 'node:module';

// The boundaries plugin resolves imports with the node resolver it depends on; named by path, as
// pnpm keeps it beside the plugin rather than at the top of node_modules.
const nodeResolver = createRequire(import.meta.resolve('eslint-plugin-boundaries')).resolve(
  'eslint-import-resolver-node',
);

export default tseslint.config(
  {
    ignores: ['**/node_modules/**', '**/dist/**', '.data/**', 'test-results/**', 'coverage/**'],
  },
  js.configs.recommended,
  ...tseslint.configs.strict,
  {
    languageOptions: { globals: { ...globals.node } },
    plugins: { 'check-file': checkFile },
    rules: {
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_' },
      ],
      '@typescript-eslint/consistent-type-imports': 'error',
      'check-file/filename-naming-convention': [
        'error',
        // Migrations start with their sequence number, e.g. 0002-cases.ts.
        {
          '**/!(migrations)/*.{ts,tsx,js,mjs}': 'KEBAB_CASE',
          '**/migrations/[0-9]*.ts': '+([0-9])-+([a-z0-9-])',
          '**/migrations/index.ts': 'KEBAB_CASE',
        },
        { ignoreMiddleExtensions: true },
      ],
      'check-file/folder-naming-convention': [
        'error',
        { '{apps,packages,tests,scripts}/**/': 'KEBAB_CASE' },
      ],
    },
  },
  {
    // Tests and benchmarks index fixtures they built themselves.
    files: ['**/*.test.{ts,tsx}', '**/bench/**/*.ts', '**/src/test/**/*.ts', 'tests/**/*.ts'],
    rules: { '@typescript-eslint/no-non-null-assertion': 'off' },
  },
  {
    files: ['apps/web/**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks },
    rules: { ...reactHooks.configs.recommended.rules },
  },
  {
    // Pure packages: no I/O, no app imports.
    files: ['packages/**/*.ts'],
    ignores: ['packages/**/*.test.ts', 'packages/*/bench/**'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['@heatpath/api', '@heatpath/web', '**/apps/**'],
              message: 'Packages never import the apps.',
            },
            {
              group: ['node:fs', 'fs', 'node:net', 'node:http', 'pg', 'sequelize', 'express'],
              message: 'Packages have no I/O.',
            },
          ],
        },
      ],
    },
  },
  {
    files: ['apps/web/src/components/**/*.{ts,tsx}', 'apps/web/src/lib/**/*.{ts,tsx}'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['**/features/**', '**/app/**'],
              message: 'Shared code knows no features or routes.',
            },
          ],
        },
      ],
    },
  },
  {
    files: ['apps/web/src/features/**/*.{ts,tsx}'],
    rules: {
      'no-restricted-imports': [
        'error',
        { patterns: [{ group: ['**/app/**'], message: 'Features never import the app layer.' }] },
      ],
    },
  },
  {
    // Web import boundaries: a feature may use components, lib, the packages and its own files,
    // never another feature; shared code (components, lib, test helpers) knows no feature.
    files: ['apps/web/src/**/*.{ts,tsx}'],
    plugins: { boundaries },
    settings: {
      'boundaries/elements': [
        {
          type: 'web-feature',
          pattern: 'apps/web/src/features/*',
          capture: ['feature'],
        },
        { type: 'web-app', pattern: 'apps/web/src/app' },
        { type: 'web-shared', pattern: 'apps/web/src/{components,lib,test,styles}' },
      ],
      'boundaries/legacy-templates': false,
      'import/resolver': { [nodeResolver]: { extensions: ['.ts', '.tsx', '.js', '.mjs'] } },
    },
    rules: {
      'boundaries/dependencies': [
        'error',
        {
          default: 'allow',
          policies: [
            {
              from: { element: { type: 'web-feature' } },
              disallow: {
                to: {
                  element: {
                    type: 'web-feature',
                    captured: { feature: '!{{ from.element.captured.feature }}' },
                  },
                },
              },
              message:
                'Features never import each other: move what two features share to apps/web/src/components or apps/web/src/lib, or let the route pass it in.',
            },
            {
              from: { element: { type: 'web-shared' } },
              disallow: { to: { element: { type: 'web-feature' } } },
              message: 'Shared code (components, lib) knows no feature.',
            },
          ],
        },
      ],
    },
  },
);
