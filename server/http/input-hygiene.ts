// One check on everything a request carries as text before any router sees it: each URL path segment must
// percent-decode (else 400 BAD_URL) and, like every query value and every string or key of a JSON body, must
// hold no NUL and no lone surrogate (else 400 BAD_TEXT naming the field). PostgreSQL cannot store either.
import type { RequestHandler } from 'express';
import { badTextReason } from '../../shared/safe-text';
import { BadTextError, BadUrlError } from './input-errors';

/** A key on the way down a parsed value; the path is built only when a bad string is found. */
type Step = { parent: Step | null; key: string | number };
type Found = { step: Step | null; reason: string };

function pathOf(step: Step | null): string {
  const keys: (string | number)[] = [];
  for (let s = step; s; s = s.parent) keys.unshift(s.key);
  return keys.reduce<string>((out, key) => {
    if (typeof key === 'number') return `${out}[${key}]`;
    const safe = /^[A-Za-z_$][\w$]*$/.test(key) ? key : JSON.stringify(key);
    return out === '' ? safe : `${out}.${safe}`;
  }, '');
}

/** The first bad string (or object key) in a parsed value. Iterative: a deeply nested body cannot overflow the stack. */
export function findBadText(root: unknown): Found | null {
  const stack: { value: unknown; step: Step | null }[] = [{ value: root, step: null }];
  while (stack.length > 0) {
    const { value, step } = stack.pop()!;
    if (typeof value === 'string') {
      const reason = badTextReason(value);
      if (reason) return { step, reason };
    } else if (Array.isArray(value)) {
      for (let i = value.length - 1; i >= 0; i--) stack.push({ value: value[i], step: { parent: step, key: i } });
    } else if (value !== null && typeof value === 'object') {
      const keys = Object.keys(value);
      for (let i = keys.length - 1; i >= 0; i--) {
        const key = keys[i];
        const reason = badTextReason(key);
        // A bad key is named by the object holding it; quoting it would carry the bad character into the message.
        if (reason) return { step, reason: `a key with ${reason}` };
        stack.push({ value: (value as Record<string, unknown>)[key], step: { parent: step, key } });
      }
    }
  }
  return null;
}

function checkPath(path: string): void {
  const segments = path.split('/');
  segments.forEach((segment, index) => {
    if (!segment.includes('%')) {
      const reason = badTextReason(segment);
      if (reason) throw new BadTextError(`URL path segment ${index}`, reason);
      return;
    }
    let decoded: string;
    try {
      decoded = decodeURIComponent(segment);
    } catch {
      throw new BadUrlError(`path segment ${index}`);
    }
    const reason = badTextReason(decoded);
    if (reason) throw new BadTextError(`URL path segment ${index}`, reason);
  });
}

export function inputHygiene(): RequestHandler {
  return (req, _res, next) => {
    checkPath(req.path);
    const inQuery = findBadText(req.query);
    if (inQuery) throw new BadTextError(`query ${pathOf(inQuery.step) || 'string'}`, inQuery.reason);
    const inBody = findBadText(req.body);
    if (inBody) throw new BadTextError(pathOf(inBody.step) || 'the request body', inBody.reason);
    next();
  };
}
