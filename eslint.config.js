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

/**
 * Layers inside server/: routes → services → queries → db. Where is the SQL? In server/queries/<area>/ only (the
 * Db/Tx/Queryable types and createDb from db/client are fine elsewhere). Services take plain ports: no Express, no
 * routes, no job-queue or HTTP code. Queries know nothing above them. Each block repeats the server-wide patterns
 * because a later block's no-restricted-imports replaces an earlier one's for the same file.
 */
function serverLayerBlocks() {
  const sql = { regex: '^drizzle-orm(/|$)|/db/schema(/|$)', message: 'SQL lives in server/queries/<area>/: call a named query function there instead.' };
  // Relative paths only: `../../auth/x` from server/queries/<area>/ is server/auth, `../auth/x` is queries/auth.
  const notAbove = (layer, folders, up) => ({
    regex: `^(\\.\\./){${up},}(${folders.join('|')})/|^(express|multer)$`,
    message: `server/${layer}/ must not reach up to ${folders.join(', ')} or Express: ${layer === 'services'
      ? 'declare the port it needs (services/ports.ts) and let the route or job pass it in.' : 'it is the bottom layer above db/.'}`,
  });
  const base = rules['server/**'];
  const block = (files, ignores, patterns) => ({ files, ignores, rules: { 'no-restricted-imports': ['error', { patterns }] } });
  return [
    block(['server/**/*.ts'], ['server/queries/**', 'server/services/**'], [...base, sql]),
    block(['server/services/**/*.ts'], [], [...base, sql, notAbove('services', ['routes', 'jobs', 'http'], 1)]),
    block(['server/queries/**/*.ts'], [], [...base, notAbove('queries', ['services', 'routes', 'jobs', 'http', 'mail', 'imports', 'auth'], 2)]),
  ];
}

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
  ...serverLayerBlocks(),
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
