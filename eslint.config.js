// @ts-check
// The house's rules, enforced by `npm test`: no import cycles, the layer boundaries, the rules of hooks.
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import importX from 'eslint-plugin-import-x';
import { createTypeScriptImportResolver } from 'eslint-import-resolver-typescript';
import reactHooks from 'eslint-plugin-react-hooks';
import astro from 'eslint-plugin-astro';
import globals from 'globals';

/** Packages the solver may import: pure math only. */
const SOLVER_PACKAGES = ['@stdlib/', 'ml-matrix'];

/** The solver's answer depends on its input alone: no clock, randomness, DOM, storage or network. */
const SOLVER_PURE = 'The solver is pure: no clock, randomness, DOM, storage or network; pass what it needs as input.';
const SOLVER_FORBIDDEN_GLOBALS = [
  'fetch', 'XMLHttpRequest', 'WebSocket', 'document', 'window', 'navigator', 'location', 'localStorage',
  'sessionStorage', 'indexedDB', 'performance', 'crypto', 'process', 'setTimeout', 'setInterval',
];

/** @param {string} target */
const serverZone = (target) => ({
  target,
  from: './src/server',
  message: 'Code that also runs in the browser never imports src/server; move the shared piece to src/lib.',
});

export default tseslint.config(
  {
    ignores: [
      'node_modules/**',
      'dist/**',
      'dist-*/**',
      '.astro/**',
      'data/**',
      'drizzle/**',
      'test-results/**',
      'playwright-report/**',
      'tmp/**',
      '.tmp-*/**',
      'tests/architecture/fixtures/**',
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  ...astro.configs['flat/recommended'],
  {
    languageOptions: { globals: { ...globals.browser, ...globals.node } },
    plugins: { 'import-x': importX },
    settings: {
      ...importX.flatConfigs.typescript.settings,
      'import-x/resolver': undefined,
      'import-x/resolver-next': [createTypeScriptImportResolver({ project: './tsconfig.json' })],
    },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none' }],
      '@typescript-eslint/no-explicit-any': 'error',
      'import-x/no-cycle': ['error', { ignoreExternal: true }],
      'import-x/no-restricted-paths': [
        'error',
        {
          zones: [
            {
              target: './src/solver',
              from: './src',
              except: ['./solver'],
              message: 'The solver is pure: it imports nothing of the web, the database or the islands.',
            },
            serverZone('./src/lib'),
            serverZone('./src/islands'),
            serverZone('./src/components'),
            serverZone('./src/workers'),
            {
              target: './src/pages',
              from: ['./src/server/db', './src/server/storage'],
              message: 'Pages and endpoints reach storage only through src/server/services.',
            },
            {
              target: './src/server',
              from: ['./src/components', './src/islands', './src/pages'],
              message: 'The server does not import UI code; share it through src/lib.',
            },
          ],
        },
      ],
    },
  },
  {
    files: ['src/solver/**/*.ts'],
    rules: {
      'no-restricted-globals': ['error', ...SOLVER_FORBIDDEN_GLOBALS.map((name) => ({ name, message: SOLVER_PURE }))],
      'no-restricted-syntax': [
        'error',
        { selector: "MemberExpression[object.name='Date'][property.name='now']", message: SOLVER_PURE },
        { selector: "NewExpression[callee.name='Date']", message: SOLVER_PURE },
        { selector: "CallExpression[callee.name='Date']", message: SOLVER_PURE },
        { selector: "MemberExpression[object.name='Math'][property.name='random']", message: SOLVER_PURE },
        { selector: "MemberExpression[object.name='globalThis']", message: SOLVER_PURE },
      ],
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              regex: `^(?!\\.|${SOLVER_PACKAGES.map((p) => p.replace(/[/.]/g, '\\$&')).join('|')})`,
              message: 'The solver imports only its own modules and pure math packages.',
            },
          ],
        },
      ],
    },
  },
  {
    files: ['**/*.tsx'],
    plugins: { 'react-hooks': reactHooks },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'error',
    },
  },
  {
    files: ['tests/**/*.ts', 'scripts/**/*.ts'],
    rules: { '@typescript-eslint/no-non-null-assertion': 'off' },
  },
);
