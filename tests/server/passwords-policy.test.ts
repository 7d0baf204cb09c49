// The password policy alone: length, the estimator's score (weak, common, own name) and plain-word feedback; and
// the first-admin set-up (ADMIN_PASSWORD and the set-up form) held to it.
import { judgePassword, PASSWORD_MIN_CHARS, personalWords } from '../../server/auth/password-policy';
import { parseSetupEnv, SetupEnvError } from '../../db/setup-env';

const person = { email: 'maria.kowalski@harbour.example', name: 'Maria Kowalski' };
const problemsOf = (password: string, who = person) => {
  const verdict = judgePassword(password, who);
  return verdict.acceptable ? [] : verdict.problems;
};

test.each([
  ['eleven characters', 'abcdefghijk', /at least 12 characters/],
  ['a top password', 'password1234', /commonly used/],
  ['a keyboard row', 'qwertyuiop123', /commonly used|row of keys/],
  ['a repeated character', 'aaaaaaaaaaaaaaa', /repeated character/],
  ['their own name with a year', 'Maria Kowalski 2024', /your own name or e-mail address/],
  ['their e-mail address', 'maria.kowalski@harbour.example', /your own name or e-mail address/],
  ['the name of this tool with a year', 'slackwater2024!', /easy to guess/],
])('%s is refused, with feedback in plain words', (_what, password, feedback) => {
  const problems = problemsOf(password);
  expect(problems.join(' ')).toMatch(feedback);
  // Plain words: whole sentences, no estimator keys like "topHundred" or "userInputs".
  for (const line of problems) expect(line).toMatch(/^[A-Z"].*\.$/);
});

test.each(['correct horse battery staple', 'tidal-Fern-oyster-88', 'quiet harbour crane ledger'])('%s is accepted', (password) => {
  expect(judgePassword(password, person)).toEqual({ acceptable: true });
});

test('the name is weak only for its owner: someone else may use words that happen to be it', () => {
  expect(problemsOf('Maria Kowalski lantern')).not.toEqual([]);
  expect(problemsOf('Maria Kowalski lantern', { email: 'o.fenn@harbour.example', name: 'Olu Fenn' })).toEqual([]);
});

test('over 1024 characters is refused before the estimator runs', () => {
  expect(problemsOf('x'.repeat(1025))).toEqual(['Use at most 1024 characters.']);
  expect(PASSWORD_MIN_CHARS).toBe(12);
});

test('personal words cover the e-mail, its parts and the name', () => {
  expect(personalWords(person)).toEqual(expect.arrayContaining(['maria.kowalski@harbour.example', 'maria', 'kowalski', 'harbour', 'maria kowalski', 'mariakowalski']));
});

describe('first-admin set-up', () => {
  const judge = (password: string, who: { email: string; name: string }) => {
    const verdict = judgePassword(password, who);
    return verdict.acceptable ? [] : verdict.problems;
  };
  test('a weak ADMIN_PASSWORD stops set-up with the feedback, naming the variable', () => {
    const env = { ADMIN_EMAIL: 'ops.lead@operator.example', ADMIN_PASSWORD: 'password1234' };
    expect(() => parseSetupEnv(env, { judgePassword: judge })).toThrow(SetupEnvError);
    expect(() => parseSetupEnv(env, { judgePassword: judge })).toThrow(/ADMIN_PASSWORD: Choose|ADMIN_PASSWORD: .*commonly used/);
  });
  test('a strong ADMIN_PASSWORD passes', () => {
    const env = { ADMIN_EMAIL: 'ops.lead@operator.example', ADMIN_PASSWORD: 'correct horse battery' };
    expect(parseSetupEnv(env, { judgePassword: judge }).admin?.email).toBe('ops.lead@operator.example');
  });
});
