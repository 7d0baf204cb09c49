// Policies: stored overrides merged over the defaults in shared/policies.ts.
import { inArray, sql } from 'drizzle-orm';
import type { Tx } from '../../../db/client';
import { policies } from '../../../db/schema';
import { POLICY_DEFAULTS, policiesSchema, type Policies, type PoliciesPatch } from '../../../shared/policies';
import type { Queryable } from '../../../db/client';
import { lockForTransaction } from '../locks/advisory-locks';

/** the advisory lock key that lockPolicies takes (exported for tests that look for its waiters) */
export const POLICIES_LOCK_KEY = 7_611_905;

export async function getPolicies(db: Queryable): Promise<Policies> {
  const keys = Object.keys(POLICY_DEFAULTS);
  const rows = await db.select().from(policies).where(inArray(policies.key, keys));
  const stored = Object.fromEntries(rows.map((r) => [r.key, r.value]));
  // A stored value that no longer fits the schema falls back to the default rather than breaking bookings.
  const merged = { ...POLICY_DEFAULTS, ...stored };
  const parsed = policiesSchema.safeParse(merged);
  return parsed.success ? parsed.data : POLICY_DEFAULTS;
}

/**
 * Serialises policy changes until the transaction ends. Policies that were never set have no row to lock,
 * so an advisory lock stands for the whole set: two admins' patches cannot both pass a check on the values
 * each read before the other wrote (e.g. one raises the low-risk quorum while the other lowers the high one).
 */
export async function lockPolicies(tx: Tx): Promise<void> {
  await lockForTransaction(tx, POLICIES_LOCK_KEY);
}

export async function upsertPolicies(tx: Tx, patch: PoliciesPatch, actorId: string, now: Date): Promise<void> {
  for (const [key, value] of Object.entries(patch)) {
    if (value === undefined) continue;
    await tx.insert(policies).values({ key, value, updatedBy: actorId, updatedAt: now })
      .onConflictDoUpdate({ target: policies.key, set: { value: sql`excluded.value`, updatedBy: actorId, updatedAt: now } });
  }
}
