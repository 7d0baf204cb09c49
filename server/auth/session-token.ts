// Session tokens: "<id>.<secret>", both random; only SHA-256 of the secret is ever stored.
import { sha256 } from '@oslojs/crypto/sha2';
import { constantTimeEqual } from '@oslojs/crypto/subtle';
import { decodeHex, encodeBase32LowerCaseNoPadding, encodeHexLowerCase } from '@oslojs/encoding';

/** 20 random bytes = 160 bits each for id and secret (the guidance asks for at least 120). */
const RANDOM_BYTES = 20;
const PART_PATTERN = /^[a-z2-7]{32}$/;

function randomPart(): string {
  const bytes = new Uint8Array(RANDOM_BYTES);
  crypto.getRandomValues(bytes);
  return encodeBase32LowerCaseNoPadding(bytes);
}

/** Hex-encoded SHA-256 of the secret, as stored in `sessions.secret_hash`. */
export function hashSessionSecret(secret: string): string {
  return encodeHexLowerCase(sha256(new TextEncoder().encode(secret)));
}

export function generateSessionToken(): { id: string; secret: string; token: string; secretHash: string } {
  const id = randomPart();
  const secret = randomPart();
  return { id, secret, token: `${id}.${secret}`, secretHash: hashSessionSecret(secret) };
}

/** Splits a token into id and secret; null when it is not shaped like one of ours. */
export function parseSessionToken(token: string): { id: string; secret: string } | null {
  const parts = token.split('.');
  if (parts.length !== 2) return null;
  const [id, secret] = parts;
  if (!PART_PATTERN.test(id) || !PART_PATTERN.test(secret)) return null;
  return { id, secret };
}

/** Constant-time check of a presented secret against the stored hash. */
export function secretMatches(secret: string, storedHashHex: string): boolean {
  let stored: Uint8Array;
  try {
    stored = decodeHex(storedHashHex);
  } catch {
    return false;
  }
  const presented = sha256(new TextEncoder().encode(secret));
  return stored.length === presented.length && constantTimeEqual(presented, stored);
}

/**
 * The name a session goes by in its owner's list: derived from the id by SHA-256, so the list carries no part of
 * the token itself (the id is half of the cookie's value).
 */
export function sessionHandle(sessionId: string): string {
  return encodeHexLowerCase(sha256(new TextEncoder().encode(`session-handle:${sessionId}`))).slice(0, 32);
}
