// The Idempotency-Key request header (as in the IETF httpapi draft "The Idempotency-Key HTTP Header Field"; memory).
import type { Request } from 'express';
import { BadIdempotencyKeyError } from '../services/windows/idempotency-errors';

const MAX_KEY_LENGTH = 200;
const VISIBLE_ASCII = /^[\x21-\x7e]+$/;

/** The header's value, or null when the client sent none; a malformed value is a 400. */
export function idempotencyKeyOf(req: Request): string | null {
  const value = req.get('Idempotency-Key');
  if (value === undefined) return null;
  const key = value.trim();
  if (key.length === 0 || key.length > MAX_KEY_LENGTH || !VISIBLE_ASCII.test(key)) throw new BadIdempotencyKeyError(MAX_KEY_LENGTH);
  return key;
}
