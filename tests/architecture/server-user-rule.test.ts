// ESLint rejects `req.user!` in server/ (handlers take the user from currentUser(req)) and leaves other code alone.
import { lintCases } from './lint-cases';

const HEADER = "import type { Request } from 'express';\n";
const CASES: [string, string, boolean][] = [
  ['server/routes/users.ts', `${HEADER}export const id = (req: Request) => req.user!.id;\n`, true],
  ['server/errors.ts', `${HEADER}export const user = (req: Request) => req.user!;\n`, true],
  ['server/routes/users.ts', `${HEADER}export const id = (req: Request) => req.user?.id;\n`, false],
];

test('req.user! is rejected in server/ and req.user?. is not', () => {
  const messages = lintCases('no-restricted-syntax', CASES.map(([f, c]) => [f, c]));
  expect(messages.map((m) => m.length > 0)).toEqual(CASES.map(([, , rejected]) => rejected));
  expect(messages[0][0]).toMatch(/currentUser\(req\)/);
});
