// One approver's side of sign-off: how many windows wait for their decision, and the decisions they already made.
import { and, desc, eq, notExists, sql, type Column } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { plans, signoffs, windows } from '../../../db/schema';

/** Null-safe "not this user": a window without an owner, or a plan without a maker, is nobody's own work. */
const notBy = (column: Column, userId: string) => sql`${column} is distinct from ${userId}`;

/**
 * Windows in review that this approver has not decided in the current round and that are not their own work
 * (they booked the window or made or accepted its plan): the same rule as the queue's "Waiting for your decision".
 * One counting query, cheap enough for a tab badge.
 */
export async function countWindowsWaitingFor(db: Queryable, approverId: string): Promise<number> {
  const decidedThisRound = db.select({ one: sql`1` }).from(signoffs).where(and(
    eq(signoffs.windowId, windows.id), eq(signoffs.round, windows.reviewRound), eq(signoffs.approverId, approverId),
  ));
  const [row] = await db.select({ n: sql<number>`count(*)::int` }).from(windows)
    .leftJoin(plans, eq(plans.id, windows.acceptedPlanId))
    .where(and(
      eq(windows.status, 'in-review'),
      notBy(windows.ownerId, approverId), notBy(plans.createdBy, approverId), notBy(plans.acceptedBy, approverId),
      notExists(decidedThisRound),
    ));
  return row?.n ?? 0;
}

/** This approver's decisions, newest first, with the window as it stands now; `limit` keeps a long history short. */
export async function selectDecisionsByApprover(db: Queryable, approverId: string, limit: number) {
  return db.select({
    windowId: windows.id, title: windows.title, windowStatus: windows.status, startsAt: windows.startsAt, endsAt: windows.endsAt,
    currentRound: windows.reviewRound, round: signoffs.round, decision: signoffs.decision, comment: signoffs.comment,
    codeConfirmed: signoffs.codeConfirmed, decidedAt: signoffs.decidedAt,
  }).from(signoffs).innerJoin(windows, eq(windows.id, signoffs.windowId))
    .where(eq(signoffs.approverId, approverId))
    .orderBy(desc(signoffs.decidedAt), desc(signoffs.id)).limit(limit);
}
