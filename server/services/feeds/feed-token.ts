// Feed tokens: 32 random bytes (256 bits), base64url without padding (43 characters); found by their SHA-256.
import { createHash, randomBytes } from 'node:crypto';

const TOKEN_BYTES = 32;
const TOKEN_PATTERN = /^[A-Za-z0-9_-]{43}$/;

export function newFeedToken(): string {
  return randomBytes(TOKEN_BYTES).toString('base64url');
}

/** Hex SHA-256 of the token, as stored in `calendar_feeds.token_hash`. */
export function hashFeedToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

/** True when `value` is shaped like one of our tokens (anything else is not looked up at all). */
export function isFeedTokenShape(value: string): boolean {
  return TOKEN_PATTERN.test(value);
}
