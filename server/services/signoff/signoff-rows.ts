// Reads for sign-off: the window with its accepted plan, decisions, approvers, and the quorum that applies.
import { and, asc, desc, eq, inArray, sql } from 'drizzle-orm';
import { plans, roleGrants, signoffs, users, windows } from '../../../db/schema';
import { planReviewSchema, type PlanReview } from '../../../shared/plans';
import type { Policies } from '../../../shared/policies';
import { riskClassOf, type RiskClass, type SignoffDecisionView } from '../../../shared/signoff';
import type { Queryable } from '../../../db/client';
import { WindowNotFoundError } from '../windows/errors';

export type SignoffWindow = {
  id: string; title: string; workType: string | null; status: string; startsAt: Date; endsAt: Date;
  ownerId: string | null; reviewRound: number; acceptedPlanId: string | null;
};
export type AcceptedPlan = {
  id: string; createdBy: string | null; acceptedBy: string | null; acceptedAt: Date | null;
  outageAccepted: string[]; review: PlanReview;
};
export type SignoffContext = { window: SignoffWindow; plan: AcceptedPlan | null };

/** The window and its accepted plan (null when none, or its review is missing); `lock` holds the window row. */
export async function loadSignoffContext(db: Queryable, windowId: string, lock = false): Promise<SignoffContext> {
  const query = db.select({
    id: windows.id, title: windows.title, workType: windows.workType, status: windows.status,
    startsAt: windows.startsAt, endsAt: windows.endsAt, ownerId: windows.ownerId,
    reviewRound: windows.reviewRound, acceptedPlanId: windows.acceptedPlanId,
  }).from(windows).where(eq(windows.id, windowId));
  // WARNING: the lock serialises decisions on one window, so two last approvals cannot both miss the quorum.
  const [window] = lock ? await query.for('update') : await query;
  if (!window) throw new WindowNotFoundError(windowId);
  return { window, plan: window.acceptedPlanId ? await loadPlan(db, window.id, window.acceptedPlanId) : null };
}

async function loadPlan(db: Queryable, windowId: string, planId: string): Promise<AcceptedPlan | null> {
  const [row] = await db.select().from(plans).where(and(eq(plans.id, planId), eq(plans.windowId, windowId)));
  const review = planReviewSchema.safeParse(row?.result);
  if (!row || row.status !== 'done' || !review.success) return null;
  return {
    id: row.id, createdBy: row.createdBy, acceptedBy: row.acceptedBy, acceptedAt: row.acceptedAt,
    outageAccepted: row.outageAccepted ?? [], review: review.data,
  };
}

/** DESIGN §2: an approver does not sign off work they booked or planned. */
export function isOwnWork(userId: string, ctx: SignoffContext): boolean {
  return ctx.window.ownerId === userId || ctx.plan?.createdBy === userId || ctx.plan?.acceptedBy === userId;
}

export function quorumFor(policies: Policies, risk: RiskClass): number {
  return risk === 'high' ? policies.signoffQuorumHigh : policies.signoffQuorumLow;
}

export function riskOfContext(ctx: SignoffContext): RiskClass {
  return ctx.plan ? riskClassOf(ctx.plan.review) : 'high';
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

export async function listDecisions(db: Queryable, windowId: string): Promise<SignoffDecisionView[]> {
  const rows = await db.select({
    round: signoffs.round, approverId: signoffs.approverId, approverName: users.name, decision: signoffs.decision,
    comment: signoffs.comment, codeConfirmed: signoffs.codeConfirmed, decidedAt: signoffs.decidedAt,
  }).from(signoffs).innerJoin(users, eq(users.id, signoffs.approverId))
    .where(eq(signoffs.windowId, windowId)).orderBy(desc(signoffs.round), asc(signoffs.decidedAt), asc(signoffs.id));
  return rows.map((r) => ({
    round: r.round, approver: { id: r.approverId, name: r.approverName }, decision: r.decision,
    comment: r.comment, codeConfirmed: r.codeConfirmed, decidedAt: r.decidedAt.toISOString(),
  }));
}

export async function listApprovers(db: Queryable): Promise<{ id: string; email: string; name: string }[]> {
  return db.select({ id: users.id, email: users.email, name: users.name }).from(users)
    .innerJoin(roleGrants, and(eq(roleGrants.userId, users.id), eq(roleGrants.role, 'approver')))
    .orderBy(asc(users.email));
}

export async function usersByIds(db: Queryable, ids: (string | null)[]): Promise<Map<string, { id: string; email: string; name: string }>> {
  const wanted = [...new Set(ids.filter((id): id is string => id !== null))];
  if (wanted.length === 0) return new Map();
  const rows = await db.select({ id: users.id, email: users.email, name: users.name }).from(users)
    .where(inArray(users.id, wanted));
  return new Map(rows.map((r) => [r.id, r]));
}
