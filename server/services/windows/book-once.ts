// Booking with an Idempotency-Key: the first request with a key books the window; a repeat of it (retry, double
// submit) within IDEMPOTENCY_TTL_MS answers with that same window and books nothing; the key with another body is refused.
import { createHash } from 'node:crypto';
import type { Db } from '../../../db/client';
import type { Me } from '../../../shared/api';
import type { WindowCreate } from '../../../shared/windows';
import { claimIdempotencyKey, selectIdempotencyKey, setIdempotencyWindow } from '../../queries/windows/idempotency-keys';
import { bookWindowIn } from './create-window';
import { IdempotencyKeyReusedError } from './idempotency-errors';

/** How long a key answers with its first window: a day covers any retry a person or a client makes. */
export const IDEMPOTENCY_TTL_MS = 24 * 60 * 60 * 1000;

/** `created` is false when the answer is the window an earlier request with the same key booked. */
export async function bookWindowOnce(
  db: Db, input: WindowCreate, user: Me, now: Date, key: string | null,
): Promise<{ id: string; created: boolean }> {
  if (key === null) return db.transaction(async (tx) => ({ id: await bookWindowIn(tx, input, user, now), created: true }));
  // The parsed input, not the raw text: the same booking sent with other spacing or key order is the same request.
  const requestHash = createHash('sha256').update(JSON.stringify(input)).digest('hex');
  const expiredBefore = new Date(now.getTime() - IDEMPOTENCY_TTL_MS);
  return db.transaction(async (tx) => {
    if (await claimIdempotencyKey(tx, { userId: user.id, key, requestHash, now, expiredBefore })) {
      const id = await bookWindowIn(tx, input, user, now);
      await setIdempotencyWindow(tx, user.id, key, id);
      return { id, created: true };
    }
    // A claimed key always has its window: both are written in one transaction, and a deleted window takes its key.
    const first = await selectIdempotencyKey(tx, user.id, key);
    if (!first?.windowId || first.requestHash !== requestHash) throw new IdempotencyKeyReusedError();
    return { id: first.windowId, created: false };
  });
}
