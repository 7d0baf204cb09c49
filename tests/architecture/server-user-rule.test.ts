// ESLint rejects `req.user!` in server/ (handlers take the user from currentUser(req)) and leaves other code alone.
import { execFileSync } from 'node:child_process';
import path from 'node:path';

const root = path.resolve(__dirname, '../..');

// ESLint loads its flat config through dynamic import(), which jest's VM does not allow: lint in a plain node process.
const LINT_SCRIPT = `
const { ESLint } = require('eslint');
const path = require('node:path');
(async () => {
  const cases = JSON.parse(require('node:fs').readFileSync(0, 'utf8'));
  const eslint = new ESLint({ cwd: process.cwd() });
  const out = [];
  for (const [file, code] of cases) {
    const [r] = await eslint.lintText(code, { filePath: path.join(process.cwd(), file) });
    out.push(r.messages.filter((m) => m.ruleId === 'no-restricted-syntax').map((m) => m.message));
  }
  process.stdout.write(JSON.stringify(out));
})();`;

const HEADER = "import type { Request } from 'express';\n";
// Typed linting only parses files its TypeScript project knows, so each case borrows the path of a real server file.
const CASES: [string, string, boolean][] = [
  ['server/routes/users.ts', `${HEADER}export const id = (req: Request) => req.user!.id;\n`, true],
  ['server/errors.ts', `${HEADER}export const user = (req: Request) => req.user!;\n`, true],
  ['server/routes/users.ts', `${HEADER}export const id = (req: Request) => req.user?.id;\n`, false],
];

test('req.user! is rejected in server/ and req.user?. is not', () => {
  const out = execFileSync(process.execPath, ['-e', LINT_SCRIPT], { cwd: root, input: JSON.stringify(CASES.map(([f, c]) => [f, c])) });
  const messages = JSON.parse(out.toString()) as string[][];
  expect(messages.map((m) => m.length > 0)).toEqual(CASES.map(([, , rejected]) => rejected));
  expect(messages[0][0]).toMatch(/currentUser\(req\)/);
});
