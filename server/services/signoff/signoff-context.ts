// Sign-off's view of a window: the window with its accepted plan, whose own work it is, its risk class and the
// quorum that applies, and its decisions in API shape.
import type { Queryable } from '../../../db/client';
import { planReviewSchema, type PlanReview } from '../../../shared/plans';
import type { Policies } from '../../../shared/policies';
import { riskClassOf, type RiskClass, type SignoffDecisionView } from '../../../shared/signoff';
import { selectPlanRow } from '../../queries/plans/plan-rows';
import { selectDecisionRows } from '../../queries/signoff/signoff-decisions';
import { selectSignoffWindow, type SignoffWindow } from '../../queries/signoff/signoff-window';
import { WindowNotFoundError } from '../windows/errors';

export type AcceptedPlan = {
  id: string; windowVersion: number; createdBy: string | null; acceptedBy: string | null; acceptedAt: Date | null;
  outageAccepted: string[]; review: PlanReview;
};
export type SignoffContext = { window: SignoffWindow; plan: AcceptedPlan | null };

/** The window and its accepted plan (null when none, or its review is missing); `lock` holds the window row. */
export async function loadSignoffContext(db: Queryable, windowId: string, lock = false): Promise<SignoffContext> {
  // WARNING: the lock serialises decisions on one window, so two last approvals cannot both miss the quorum.
  const window = await selectSignoffWindow(db, windowId, { forUpdate: lock });
  if (!window) throw new WindowNotFoundError(windowId);
  return { window, plan: window.acceptedPlanId ? await loadPlan(db, window.id, window.acceptedPlanId) : null };
}

/** The plan only when it belongs to this window, finished, and its stored review still reads. */
async function loadPlan(db: Queryable, windowId: string, planId: string): Promise<AcceptedPlan | null> {
  const row = await selectPlanRow(db, planId);
  const review = planReviewSchema.safeParse(row?.result);
  if (!row || row.windowId !== windowId || row.status !== 'done' || !review.success) return null;
  return {
    id: row.id, windowVersion: row.windowVersion, createdBy: row.createdBy, acceptedBy: row.acceptedBy, acceptedAt: row.acceptedAt,
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

export async function listDecisions(db: Queryable, windowId: string): Promise<SignoffDecisionView[]> {
  const rows = await selectDecisionRows(db, windowId);
  return rows.map((r) => ({
    round: r.round, approver: { id: r.approverId, name: r.approverName }, decision: r.decision,
    comment: r.comment, codeConfirmed: r.codeConfirmed, decidedAt: r.decidedAt.toISOString(),
  }));
}
