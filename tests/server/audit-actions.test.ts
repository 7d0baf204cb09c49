// Every audit action code the server writes has plain words for the trail, and the change summary never lets a
// secret through. The codes are read from server/'s source, so a new action fails here until it has words.
import fs from 'node:fs';
import path from 'node:path';
import fc from 'fast-check';
import { actionWords, AUDIT_ACTION_WORDS } from '../../shared/audit-actions';
import { MAX_CHANGE_LINES, summariseChanges } from '../../server/services/audit/change-summary';

const SERVER_DIR = path.join(__dirname, '../../server');

/**
 * Codes written anywhere in server/: `action: '…'` properties, `…ACTION = '…'` constants, and every quoted code on
 * a line that assigns an `action` variable (e.g. a ternary choosing between codes).
 */
function writtenActionCodes(): string[] {
  const files = fs.readdirSync(SERVER_DIR, { recursive: true }).map(String).filter((f) => f.endsWith('.ts'));
  const codes = new Set<string>();
  for (const file of files) {
    const source = fs.readFileSync(path.join(SERVER_DIR, file), 'utf8');
    for (const [, code] of source.matchAll(/\baction:\s*['"`]([a-z][\w.-]*)['"`]/g)) codes.add(code);
    for (const [, code] of source.matchAll(/\b[A-Z_]*ACTION[A-Z_]*\s*=\s*['"`]([a-z][\w.-]*)['"`]/g)) codes.add(code);
    for (const [line] of source.matchAll(/\b(?:const|let)\s+action\s*=.*$/gm)) {
      for (const [, code] of line.matchAll(/['"`]([a-z][\w-]*\.[\w.-]+)['"`]/g)) codes.add(code);
    }
  }
  return [...codes].sort();
}

test('the scan finds codes written each way (properties, constants and chosen in a ternary)', () => {
  expect(writtenActionCodes()).toEqual(expect.arrayContaining(['window.create', 'otp.code-failed', 'placement.plan-rollback', 'sign-in']));
});

test('every action code written anywhere in server/ has words', () => {
  expect(writtenActionCodes().filter((code) => !Object.hasOwn(AUDIT_ACTION_WORDS, code))).toEqual([]);
});

test('the words read as a sentence start, never as the code itself', () => {
  for (const [code, words] of Object.entries(AUDIT_ACTION_WORDS)) {
    expect([code, /^[A-Z]/.test(words) && words !== code && !words.includes('.')]).toEqual([code, true]);
  }
});

test('a code without words still reads as words, never blank', () => {
  expect(actionWords('gadget.polish-all')).toBe('Gadget polish all');
  fc.assert(fc.property(fc.string(), (code) => actionWords(code).trim().length > 0));
});

test('changed fields are named in words with readable values; book-keeping fields are left out', () => {
  expect(summariseChanges({ status: 'draft', version: 1 }, { status: 'in-review', version: 2 }, 'UTC')).toEqual(['Status: Draft → In review']);
  expect(summariseChanges(null, { title: 'Fibre splice', ownerId: 'u-1' }, 'UTC')).toEqual(['Title: Fibre splice']);
  expect(summariseChanges({ startsAt: '2027-01-12T21:00:00.000Z' }, { startsAt: '2027-01-12T22:00:00.000Z' }, 'Europe/Oslo'))
    .toEqual(['Start: Tue, 12 Jan 2027, 22:00 CET → Tue, 12 Jan 2027, 23:00 CET']);
  expect(summariseChanges({ elements: [1] }, { elements: [2] }, 'UTC')).toEqual(['Sites and spans taken out changed']);
  expect(summariseChanges({ a: 1 }, { a: 1 }, 'UTC')).toEqual([]);
});

test('a long list of changes is cut to a few lines that count the rest', () => {
  const after = Object.fromEntries(Array.from({ length: 12 }, (_, i) => [`field${i}`, i]));
  const lines = summariseChanges({}, after, 'UTC');
  expect(lines).toHaveLength(MAX_CHANGE_LINES);
  expect(lines.at(-1)).toBe(`and ${12 - MAX_CHANGE_LINES + 1} more fields`);
});

const SECRET_KEYS = ['password', 'passwordHash', 'token', 'tokenHash', 'secret', 'otpSecret', 'code', 'resetCode', 'apiKey', 'salt'];

test('whatever a row holds, no secret field nor its value is ever summarised', () => {
  fc.assert(fc.property(
    fc.constantFrom(...SECRET_KEYS), fc.string({ minLength: 6 }).map((s) => `S3cr3t${s}`), fc.string({ minLength: 6 }).map((s) => `S3cr3t${s}`),
    (key, before, after) => {
      const text = summariseChanges({ [key]: before }, { [key]: after, title: 'Kept' }, 'UTC').join('\n');
      return !text.includes('S3cr3t') && !text.toLowerCase().includes(key.toLowerCase());
    },
  ));
});
