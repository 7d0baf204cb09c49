// Counted sign-in attempts per account or client address: read newest first, added, released, pruned.
import { and, desc, eq, gt, inArray, lt } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { signInFailures } from '../../../db/schema';

export type SignInKeyKind = 'account' | 'address';

/** The times of the newest `limit` attempts for the key after `since`, newest first. */
export async function listRecentSignInFailures(
  db: Queryable,
  { keyKind, key, since, limit }: { keyKind: SignInKeyKind; key: string; since: Date; limit: number },
): Promise<Date[]> {
  const rows = await db
    .select({ at: signInFailures.at })
    .from(signInFailures)
    .where(and(eq(signInFailures.keyKind, keyKind), eq(signInFailures.key, key), gt(signInFailures.at, since)))
    .orderBy(desc(signInFailures.at))
    .limit(limit);
  return rows.map((row) => row.at);
}

export async function insertSignInFailure(
  db: Queryable,
  { keyKind, key, at }: { keyKind: SignInKeyKind; key: string; at: Date },
): Promise<number> {
  const [row] = await db.insert(signInFailures).values({ keyKind, key, at }).returning({ id: signInFailures.id });
  return row.id;
}

export async function deleteSignInFailuresById(db: Queryable, { ids }: { ids: number[] }): Promise<void> {
  if (ids.length > 0) await db.delete(signInFailures).where(inArray(signInFailures.id, ids));
}

export async function deleteSignInFailuresForKey(db: Queryable, { keyKind, key }: { keyKind: SignInKeyKind; key: string }): Promise<void> {
  await db.delete(signInFailures).where(and(eq(signInFailures.keyKind, keyKind), eq(signInFailures.key, key)));
}

export async function deleteSignInFailuresBefore(db: Queryable, { before }: { before: Date }): Promise<void> {
  await db.delete(signInFailures).where(lt(signInFailures.at, before));
}
