// One-time link tokens: made here (setup prints the set-up link), checked by the server; only the hash is stored.
import { createHash, randomBytes } from 'node:crypto';
import { and, eq, isNull } from 'drizzle-orm';
import type { Queryable } from '../client';
import { oneTimeLinks, type OneTimeLinkKind } from '../schema';

/** 32 random bytes (256 bits), base64url without padding: 43 characters, safe in a URL as is. */
export function newLinkToken(): string {
  return randomBytes(32).toString('base64url');
}

/** Hex SHA-256 of the token, as stored in one_time_links.token_hash. */
export function hashLinkToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

/**
 * Stores a new link of `kind` and removes the unused ones of that kind before it (only the newest link printed
 * works). Returns the token to hand out.
 */
export async function replaceUnusedLink(
  db: Queryable,
  { kind, now, validSeconds, email = null, userId = null }:
    { kind: OneTimeLinkKind; now: Date; validSeconds: number; email?: string | null; userId?: string | null },
): Promise<string> {
  const token = newLinkToken();
  await db.delete(oneTimeLinks).where(and(eq(oneTimeLinks.kind, kind), isNull(oneTimeLinks.usedAt)));
  await db.insert(oneTimeLinks).values({
    id: `link-${randomBytes(9).toString('base64url')}`, kind, tokenHash: hashLinkToken(token), email, userId,
    expiresAt: new Date(now.getTime() + validSeconds * 1000), createdAt: now,
  });
  return token;
}
