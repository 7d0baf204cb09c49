// Writes to a slice's placement history: one current revision per slice, each change a new revision.
import { and, desc, eq } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { placements } from '../../../db/schema';

/** The slice's newest revision number, locked until the transaction ends; null when the slice has none. */
export async function lockLatestPlacementRevision(tx: Queryable, sliceId: string): Promise<number | null> {
  const [latest] = await tx.select({ revision: placements.revision }).from(placements)
    .where(eq(placements.sliceId, sliceId)).orderBy(desc(placements.revision)).limit(1).for('update');
  return latest?.revision ?? null;
}

/** Marks the slice's current revision as no longer current; returns its number, or null when none was. */
export async function retireCurrentPlacement(tx: Queryable, sliceId: string): Promise<number | null> {
  const [current] = await tx.update(placements).set({ current: false })
    .where(and(eq(placements.sliceId, sliceId), eq(placements.current, true))).returning({ revision: placements.revision });
  return current?.revision ?? null;
}

export async function insertCurrentPlacement(tx: Queryable, row: {
  sliceId: string; revision: number; sites: Record<string, string>; paths: Record<string, string[]>;
  reason: string; createdBy: string | null; createdAt: Date;
}): Promise<void> {
  await tx.insert(placements).values({ ...row, current: true });
}
