// Approvers' decisions (`signoffs` rows): one per approver and review round.
import { and, asc, desc, eq, sql } from 'drizzle-orm';
import type { Queryable, Tx } from '../../../db/client';
import { signoffs, users } from '../../../db/schema';

export async function insertSignoffDecision(tx: Tx, row: typeof signoffs.$inferInsert): Promise<void> {
  await tx.insert(signoffs).values(row);
}

export async function countApprovals(db: Queryable, windowId: string, round: number): Promise<number> {
  const [row] = await db.select({ n: sql<number>`count(*)::int` }).from(signoffs)
    .where(and(eq(signoffs.windowId, windowId), eq(signoffs.round, round), eq(signoffs.decision, 'approve')));
  return row?.n ?? 0;
}

export async function hasDecided(db: Queryable, windowId: string, round: number, approverId: string): Promise<boolean> {
  const rows = await db.select({ id: signoffs.id }).from(signoffs)
    .where(and(eq(signoffs.windowId, windowId), eq(signoffs.round, round), eq(signoffs.approverId, approverId)));
  return rows.length > 0;
}

/** Every decision on the window with its approver's name: newest round first, then in the order made. */
export async function selectDecisionRows(db: Queryable, windowId: string) {
  return db.select({
    round: signoffs.round, approverId: signoffs.approverId, approverName: users.name, decision: signoffs.decision,
    comment: signoffs.comment, codeConfirmed: signoffs.codeConfirmed, decidedAt: signoffs.decidedAt,
  }).from(signoffs).innerJoin(users, eq(users.id, signoffs.approverId))
    .where(eq(signoffs.windowId, windowId)).orderBy(desc(signoffs.round), asc(signoffs.decidedAt), asc(signoffs.id));
}
