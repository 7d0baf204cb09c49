// Freeze periods: list, overlap look-up for bookings, and admin writes.
import { and, asc, eq, gt, lt } from 'drizzle-orm';
import type { Tx } from '../../../db/client';
import { freezes } from '../../../db/schema';
import type { Queryable } from '../../../db/client';

export type FreezeRow = typeof freezes.$inferSelect;

export async function listFreezes(db: Queryable, range: { from?: Date; to?: Date } = {}): Promise<FreezeRow[]> {
  const conds = [range.from ? gt(freezes.endsAt, range.from) : undefined, range.to ? lt(freezes.startsAt, range.to) : undefined];
  return db.select().from(freezes).where(and(...conds)).orderBy(asc(freezes.startsAt), asc(freezes.id));
}

/** Freezes overlapping [startsAt, endsAt), earliest first. */
export async function overlappingFreezes(db: Queryable, startsAt: Date, endsAt: Date): Promise<FreezeRow[]> {
  return listFreezes(db, { from: startsAt, to: endsAt });
}

export async function getFreeze(db: Queryable, id: string): Promise<FreezeRow | null> {
  return (await db.select().from(freezes).where(eq(freezes.id, id)))[0] ?? null;
}

export async function insertFreeze(tx: Tx, row: typeof freezes.$inferInsert): Promise<FreezeRow> {
  return (await tx.insert(freezes).values(row).returning())[0];
}

export async function updateFreeze(
  tx: Tx, id: string, set: Partial<Pick<FreezeRow, 'title' | 'startsAt' | 'endsAt' | 'reason'>>,
): Promise<FreezeRow | null> {
  return (await tx.update(freezes).set(set).where(eq(freezes.id, id)).returning())[0] ?? null;
}

export async function deleteFreeze(tx: Tx, id: string): Promise<FreezeRow | null> {
  return (await tx.delete(freezes).where(eq(freezes.id, id)).returning())[0] ?? null;
}
