// Accepts a finished plan run as the window's plan: re-verified on the current data, then window → planned.
import type { Db } from '../../../db/client';
import type { Me } from '../../../shared/api';
import { PLANNABLE_STATES } from '../../../shared/permissions';
import { planReviewSchema, type PlanAccept } from '../../../shared/plans';
import { insertAuditEntry } from '../../queries/audit/audit-log';
import { lockForTransaction } from '../../queries/locks/advisory-locks';
import { markPlanAccepted, selectPlanRow } from '../../queries/plans/plan-rows';
import { setWindowStatus } from '../windows/set-window-status';
import { checkOutageAccepted, checkStillFits } from './accept-checks';
import { PlanNotAcceptableError, PlanNotFoundError, WindowNotPlannableError } from './errors';
import { isStale, loadWindowFacts } from './plan-view';

/**
 * WARNING: accepts are serialised. Each verifies against the capacity other accepted plans hold; two accepts
 * of overlapping windows checked side by side could each fit alone and double-book together.
 */
const ACCEPT_LOCK_KEY = 6_170_331;

export async function acceptPlan(deps: { db: Db; now: Date }, planId: string, body: PlanAccept, user: Me): Promise<void> {
  const { db, now } = deps;
  await db.transaction(async (tx) => {
    await lockForTransaction(tx, ACCEPT_LOCK_KEY);
    const row = await selectPlanRow(tx, planId, { forUpdate: true });
    if (!row) throw new PlanNotFoundError(planId);
    const w = await loadWindowFacts(tx, row.windowId, { forUpdate: true });
    if (row.status !== 'done') throw new PlanNotAcceptableError('PLAN_NOT_DONE', `Only a finished plan can be accepted; this one is ${row.status}.`);
    if (isStale(row, w)) {
      throw new PlanNotAcceptableError('PLAN_STALE', 'The window was edited or re-assessed after this run; run the plan again.');
    }
    if (!PLANNABLE_STATES.includes(w.status)) throw new WindowNotPlannableError(w.status);
    const review = planReviewSchema.parse(row.result);
    const outageAccepted = checkOutageAccepted(review, body.outageAccepted);
    const reservedFor = await checkStillFits({ tx, pool: db }, row.windowId, review);
    await markPlanAccepted(tx, planId, { userId: user.id, outageAccepted, now });
    await setWindowStatus(tx, {
      windowId: row.windowId, from: PLANNABLE_STATES, to: 'planned', actorId: user.id, action: 'plan.accept', now,
      set: { acceptedPlanId: planId }, details: { planId, outageAccepted, reservedFor },
    });
    await insertAuditEntry(tx, {
      actorId: user.id, action: 'plan.accept', entity: 'plan', entityId: planId, at: now,
      before: { accepted: false, previousPlanId: w.acceptedPlanId }, after: { accepted: true, outageAccepted, reservedFor },
    });
  });
}
