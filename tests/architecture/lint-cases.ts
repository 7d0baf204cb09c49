// Lints made-up source files against the project's eslint.config.js and returns one rule's messages per file.
import { execFileSync } from 'node:child_process';
import path from 'node:path';

const root = path.resolve(__dirname, '../..');

// ESLint loads its flat config through dynamic import(), which jest's VM does not allow, so the cases are linted
// in one plain node process. Typed linting is switched off for them: it parses only files its TypeScript project
// knows, and these files exist only to show which code a rule refuses where.
const LINT_SCRIPT = `
const { ESLint } = require('eslint');
const path = require('node:path');
(async () => {
  const { ruleId, cases } = JSON.parse(require('node:fs').readFileSync(0, 'utf8'));
  const eslint = new ESLint({ cwd: process.cwd(), overrideConfig: {
    languageOptions: { parserOptions: { projectService: false } },
    rules: { '@typescript-eslint/no-floating-promises': 'off', '@typescript-eslint/no-misused-promises': 'off' },
  } });
  const out = [];
  for (const [file, code] of cases) {
    const [r] = await eslint.lintText(code, { filePath: path.join(process.cwd(), file) });
    out.push(r.messages.filter((m) => m.ruleId === ruleId).map((m) => m.message));
  }
  process.stdout.write(JSON.stringify(out));
})();`;

/** For each [file path, source] case, the messages `ruleId` reports (empty when the rule lets it pass). */
export function lintCases(ruleId: string, cases: [string, string][]): string[][] {
  const out = execFileSync(process.execPath, ['-e', LINT_SCRIPT], { cwd: root, input: JSON.stringify({ ruleId, cases }) });
  return JSON.parse(out.toString()) as string[][];
}
