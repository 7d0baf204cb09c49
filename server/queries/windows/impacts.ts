// The stored impact of a window (one row per window, replaced on each assessment).
import { eq, sql } from 'drizzle-orm';
import type { Tx } from '../../../db/client';
import { windowImpacts } from '../../../db/schema';
import type { WindowImpact } from '../../../shared/window-impact';
import type { Queryable } from '../../../db/client';

export async function upsertWindowImpact(tx: Tx, impact: WindowImpact): Promise<void> {
  const row = { windowId: impact.windowId, windowVersion: impact.windowVersion, computedAt: new Date(impact.computedAt), impact };
  await tx.insert(windowImpacts).values(row)
    .onConflictDoUpdate({ target: windowImpacts.windowId, set: { windowVersion: row.windowVersion, computedAt: row.computedAt, impact } });
}

export async function getWindowImpact(db: Queryable, windowId: string): Promise<WindowImpact | null> {
  const rows = await db.select({ impact: windowImpacts.impact }).from(windowImpacts).where(eq(windowImpacts.windowId, windowId));
  return (rows[0]?.impact as WindowImpact | undefined) ?? null;
}

/**
 * The stored impact as JSON text, for serving as is: on a big window (2,500 slices touched, 1.5 MB) parsing,
 * re-validating and re-serialising it cost more than the rest of the request. It was validated when computed.
 */
export async function getWindowImpactJson(db: Queryable, windowId: string): Promise<string | null> {
  const rows = await db.select({ json: sql<string>`${windowImpacts.impact}::text` }).from(windowImpacts)
    .where(eq(windowImpacts.windowId, windowId));
  return rows[0]?.json ?? null;
}

/** What identifies one stored impact: the window version it was computed for, and when. */
export async function getWindowImpactStamp(db: Queryable, windowId: string): Promise<string | null> {
  const rows = await db.select({ version: windowImpacts.windowVersion, at: windowImpacts.computedAt }).from(windowImpacts)
    .where(eq(windowImpacts.windowId, windowId));
  return rows[0] ? `${rows[0].version}@${rows[0].at.toISOString()}` : null;
}

/** Returns whether a stored impact was dropped. */
export async function deleteWindowImpact(tx: Tx, windowId: string): Promise<boolean> {
  const deleted = await tx.delete(windowImpacts).where(eq(windowImpacts.windowId, windowId)).returning({ id: windowImpacts.windowId });
  return deleted.length > 0;
}
