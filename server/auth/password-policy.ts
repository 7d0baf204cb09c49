// The password policy for every password a person chooses (first admin, reset, change): at least 12 characters,
// at most 1024, and not weak or common by the zxcvbn estimator, whose feedback is handed back in plain words.
// Reference: NIST SP 800-63B §3.1.1.2 (length over composition rules; refuse common, breached and context words).
import { ZxcvbnFactory, type ZxcvbnResult } from '@zxcvbn-ts/core';
import { adjacencyGraphs, dictionary } from '@zxcvbn-ts/language-common';
import { PASSWORD_MAX_CHARS, PASSWORD_MIN_CHARS } from '../../shared/passwords';
import { domainError } from '../errors';

export { PASSWORD_MAX_CHARS, PASSWORD_MIN_CHARS };
/**
 * WARNING: the lowest zxcvbn score accepted. 3 means about 10^8 guesses or more ("safely unguessable"): with
 * argon2id hashes and sign-in limits that is years of work online and slow offline, while 4 (10^10) refuses many
 * memorable passphrases and pushes people to write passwords down. 2 and below fall to an offline guesser in hours.
 */
export const PASSWORD_MIN_SCORE = 3;

/** Words any guesser tries first on this tool, whoever the user is (NIST's "context-specific words"). */
const CONTEXT_WORDS = ['slackwater', 'maintenance', 'window', 'password', 'network', 'slice'];

/** The estimator's warnings and suggestions, in the product's own plain words. */
const WARNINGS: Record<string, string> = {
  straightRow: 'A row of keys on the keyboard is easy to guess.',
  keyPattern: 'A short pattern on the keyboard is easy to guess.',
  simpleRepeat: 'A repeated character like "aaa" is easy to guess.',
  extendedRepeat: 'A repeated group like "abcabcabc" is easy to guess.',
  sequences: 'A sequence like "abc" or "6543" is easy to guess.',
  recentYears: 'Recent years are easy to guess.',
  dates: 'Dates are easy to guess.',
  topTen: 'This is one of the ten most used passwords.',
  topHundred: 'This is one of the hundred most used passwords.',
  common: 'This is a commonly used password.',
  similarToCommon: 'This is very like a commonly used password.',
  wordByItself: 'A single word is easy to guess.',
  namesByThemselves: 'A name on its own is easy to guess.',
  commonNames: 'Common names are easy to guess.',
  userInputs: 'It is built from your own name or e-mail address.',
  pwned: 'This password has appeared in a data breach.',
};
const SUGGESTIONS: Record<string, string> = {
  l33t: 'Letters swapped for look-alike digits ("@" for "a") do not help much.',
  reverseWords: 'A common word spelt backwards does not help much.',
  allUppercase: 'Capitalise some letters, not all of them.',
  capitalization: 'Capitalise more than the first letter.',
  dates: 'Leave out dates that mean something to you.',
  recentYears: 'Leave out recent years.',
  associatedYears: 'Leave out years that mean something to you.',
  sequences: 'Leave out common sequences of characters.',
  repeated: 'Leave out repeated words and characters.',
  longerKeyboardPattern: 'Leave out keyboard patterns.',
  anotherWord: 'Add a few more words that are less common.',
  useWords: 'Use several unrelated words together.',
  noNeed: 'Symbols, digits and capital letters are not required.',
  pwned: 'If you use this password elsewhere, change it there too.',
};

let estimator: ZxcvbnFactory | null = null;
/** Built on first use: ranking the dictionaries takes a moment and memory that a process not choosing passwords skips. */
function getEstimator(): ZxcvbnFactory {
  estimator ??= new ZxcvbnFactory({
    dictionary: { ...dictionary, context: CONTEXT_WORDS },
    graphs: adjacencyGraphs,
    // No translations: feedback then comes back as the estimator's keys, worded below in our own words.
    // Off: near-miss matching of the whole password costs a tenth of a second or more per check on the event loop,
    // and the common-password list with its l33t and reversed variants already catches the usual near misses.
    useLevenshteinDistance: false,
  });
  return estimator;
}

/** What the person's own details give a guesser: the e-mail, its local part and domain, the name and its parts. */
export function personalWords(person: { email?: string | null; name?: string | null }): string[] {
  const words = new Set<string>();
  const email = person.email?.trim().toLowerCase();
  if (email) {
    words.add(email);
    for (const part of email.split(/[@.+_-]/)) if (part.length >= 3) words.add(part);
  }
  const name = person.name?.trim().toLowerCase();
  if (name) {
    words.add(name);
    words.add(name.replace(/\s+/g, ''));
    for (const part of name.split(/[\s.'-]+/)) if (part.length >= 3) words.add(part);
  }
  return [...words];
}

export type PasswordVerdict = { acceptable: true } | { acceptable: false; problems: string[] };

function feedbackOf(result: ZxcvbnResult): string[] {
  const warning = result.feedback.warning ? WARNINGS[result.feedback.warning] : undefined;
  const suggestions = result.feedback.suggestions.map((s) => SUGGESTIONS[s]).filter((s): s is string => Boolean(s));
  const lines = [warning ?? 'It is too easy to guess.', ...suggestions];
  if (suggestions.length === 0) lines.push('Add a few more words that are less common.');
  return lines;
}

/**
 * What is left of `password` once the person's own words are taken out, letters and digits only. The estimator
 * scores "Maria Kowalski 2024" as two unknown-ish words; a guesser who knows the person tries it early.
 */
function withoutPersonalWords(password: string, words: string[]): string {
  let rest = password.toLowerCase();
  for (const word of [...words].sort((a, b) => b.length - a.length)) if (word.length >= 3) rest = rest.split(word).join(' ');
  return rest.replace(/[^\p{L}\p{N}]+/gu, '');
}
/** Fewer own characters than this beside the person's name and e-mail: the password is mostly about them. */
const MIN_OWN_CHARS = 8;

/** Judges `password` for the person it belongs to; `problems` are sentences a person can act on. */
export function judgePassword(password: string, person: { email?: string | null; name?: string | null } = {}): PasswordVerdict {
  if (password.length < PASSWORD_MIN_CHARS) return { acceptable: false, problems: [`Use at least ${PASSWORD_MIN_CHARS} characters.`] };
  if (password.length > PASSWORD_MAX_CHARS) return { acceptable: false, problems: [`Use at most ${PASSWORD_MAX_CHARS} characters.`] };
  const words = personalWords(person);
  if (words.length > 0 && withoutPersonalWords(password, words).length < MIN_OWN_CHARS) {
    return { acceptable: false, problems: [WARNINGS.userInputs, SUGGESTIONS.useWords] };
  }
  const result = getEstimator().check(password, words);
  return result.score >= PASSWORD_MIN_SCORE ? { acceptable: true } : { acceptable: false, problems: feedbackOf(result) };
}

/** A refused password: the message is the estimator's feedback in plain words, never the password itself. */
export class WeakPasswordError extends domainError('WEAK_PASSWORD', 400,
  (problems: string[]) => `Choose another password. ${problems.join(' ')}`) {}

/** Throws WeakPasswordError unless `password` meets the policy for `person`. */
export function assertPasswordAcceptable(password: string, person: { email?: string | null; name?: string | null } = {}): void {
  const verdict = judgePassword(password, person);
  if (!verdict.acceptable) throw new WeakPasswordError(verdict.problems);
}
