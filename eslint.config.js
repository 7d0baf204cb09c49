// ESLint: TypeScript rules plus the folder import rules from DEVELOPERS.md ("Architecture").
const tseslint = require('typescript-eslint');
const globals = require('globals');
const reactHooks = require('eslint-plugin-react-hooks');

const nodeBuiltins = ['node:*', 'fs', 'path', 'os', 'child_process', 'worker_threads', 'http', 'net', 'crypto'];
const pattern = (group, message) => ({ group, message });

/** Folder → what it must not import. */
const rules = {
  'shared/**': [
    { regex: '^(?!zod$|\\./)', message: 'shared/ imports only zod and its own files.' },
  ],
  'planner/**': [
    pattern(['../../server/*', '../server/*', '../../db/*', '../db/*', '../../app/*', '../../components/*', '../../hooks/*', '@/*'],
      'planner/ is pure: it must not import server, db or app code.'),
    pattern(['../../scenarios/*', '../scenarios/*', '../../../scenarios/*'],
      'planner/ must not import scenarios/: the generators and demo data build inputs for tests, the bench and the demo.'),
    pattern(['pg', 'drizzle-orm', 'drizzle-orm/*', 'express', 'react', 'react-native', ...nodeBuiltins],
      'planner/ is pure computation: no I/O, database, server or node built-ins (only planner/workers and planner/cli may).'),
  ],
  'db/**': [
    pattern(['../server/*', '../../server/*', '../planner/*', '../../planner/*', '../app/*', 'express', 'react', 'react-native'],
      'db/ imports drizzle, pg and shared only.'),
  ],
  'server/**': [
    pattern(['../app/*', '../../app/*', '../components/*', '../../components/*', '../hooks/*', '../../hooks/*', 'react', 'react-native', 'expo', 'expo-*', '@expo/*'],
      'server/ must not import app code.'),
  ],
  'app/**': [
    pattern(['@/server/*', '@/db/*', '@/planner/*', '../server/*', '../db/*', '../planner/*', 'pg', 'drizzle-orm', 'express', ...nodeBuiltins],
      'app/ holds routes only; it imports components, hooks, constants and shared.'),
  ],
  'components/**': [
    pattern(['@/server/*', '@/db/*', '@/planner/*', '../server/*', '../db/*', '../planner/*', 'pg', 'drizzle-orm', 'express', ...nodeBuiltins],
      'components/ must not import server, db or planner code.'),
  ],
  'hooks/**': [
    pattern(['@/server/*', '@/db/*', '@/planner/*', '../server/*', '../db/*', '../planner/*', 'pg', 'drizzle-orm', 'express', ...nodeBuiltins],
      'hooks/ must not import server, db or planner code.'),
  ],
};

module.exports = tseslint.config(
  { ignores: ['node_modules/', 'dist/', '.data/', '.expo/', 'web-build/', 'coverage/', 'test-results/', '**/*.js', '!eslint.config.js'] },
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser, ...globals.jest } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/no-require-imports': 'off',
    },
  },
  {
    // Typed linting: a promise nobody awaits loses its error, and one handed to a void callback runs unawaited.
    // Express 5 route handlers need no exception: its router forwards a returned promise's rejection to the error
    // middleware, and @types/express 5 types a handler's return as unknown, so no-misused-promises accepts them.
    files: ['**/*.{ts,tsx}'],
    languageOptions: { parserOptions: { projectService: true, tsconfigRootDir: __dirname } },
    rules: {
      '@typescript-eslint/no-floating-promises': 'error',
      '@typescript-eslint/no-misused-promises': 'error',
    },
  },
  ...Object.entries(rules).map(([files, patterns]) => ({
    files: [files.replace('/**', '/**/*.{ts,tsx}')],
    ignores: files === 'planner/**' ? ['planner/workers/**', 'planner/cli/**'] : [],
    rules: { 'no-restricted-imports': ['error', { patterns: patterns }] },
  })),
  {
    // Where is the SQL? In server/queries/<area>/ only: the rest of the server imports no drizzle and no schema
    // (the Db/Tx/Queryable types and createDb from db/client are fine).
    files: ['server/**/*.ts'],
    ignores: ['server/queries/**'],
    rules: {
      'no-restricted-imports': ['error', { patterns: [...rules['server/**'], {
        regex: '^drizzle-orm(/|$)|/db/schema(/|$)',
        message: 'SQL lives in server/queries/<area>/: call a named query function there instead.',
      }] }],
    },
  },
  {
    // The worker wrapper and the command line are planner's only doors to the outside world.
    files: ['planner/workers/**/*.ts', 'planner/cli/**/*.ts'],
    rules: { 'no-restricted-imports': ['error', { patterns: rules['planner/**'].slice(0, 2) }] },
  },
  {
    // Hooks called out of order, or effects missing a dependency, show stale data without any error.
    files: ['app/**/*.{ts,tsx}', 'components/**/*.{ts,tsx}', 'hooks/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    rules: { 'react-hooks/rules-of-hooks': 'error', 'react-hooks/exhaustive-deps': 'error' },
  },
  {
    // `req.user!` turns a missing guard into a crash deep in a service; currentUser(req) answers 401 instead.
    files: ['server/**/*.ts'],
    rules: {
      'no-restricted-syntax': ['error', {
        selector: 'TSNonNullExpression > MemberExpression[property.name="user"]',
        message: 'Take the signed-in user from currentUser(req) (server/auth/guards.ts), not req.user!.',
      }],
    },
  },
);
