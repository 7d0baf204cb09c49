// Rows of `window_idempotency_keys`: which window a user's Idempotency-Key booked, and with which request.
import { and, eq, lt } from 'drizzle-orm';
import type { Queryable, Tx } from '../../../db/client';
import { windowIdempotencyKeys as keys } from '../../../db/schema';

type Claim = { userId: string; key: string; requestHash: string; now: Date; expiredBefore: Date };

/**
 * Claims the key for this transaction: true when it was free or its last use is older than `expiredBefore`.
 * WARNING: insert first. A parallel request with the same key blocks on the primary key until this transaction
 * ends, then finds the committed row (false) — so two requests with one key never both book.
 */
export async function claimIdempotencyKey(tx: Tx, c: Claim): Promise<boolean> {
  const rows = await tx.insert(keys)
    .values({ userId: c.userId, key: c.key, requestHash: c.requestHash, windowId: null, createdAt: c.now })
    .onConflictDoUpdate({
      target: [keys.userId, keys.key],
      set: { requestHash: c.requestHash, windowId: null, createdAt: c.now },
      where: lt(keys.createdAt, c.expiredBefore),
    })
    .returning({ key: keys.key });
  return rows.length > 0;
}

export async function selectIdempotencyKey(db: Queryable, userId: string, key: string): Promise<{ requestHash: string; windowId: string | null } | null> {
  const [row] = await db.select({ requestHash: keys.requestHash, windowId: keys.windowId }).from(keys)
    .where(and(eq(keys.userId, userId), eq(keys.key, key)));
  return row ?? null;
}

export async function setIdempotencyWindow(tx: Tx, userId: string, key: string, windowId: string): Promise<void> {
  await tx.update(keys).set({ windowId }).where(and(eq(keys.userId, userId), eq(keys.key, key)));
}
