// Accepts a finished plan run as the window's plan: re-verified on the current data, then window → planned.
import type { Db } from '../../../db/client';
import type { Me } from '../../../shared/api';
import { PLANNABLE_STATES } from '../../../shared/permissions';
import { planReviewSchema, type PlanAccept } from '../../../shared/plans';
import { insertAuditEntry } from '../../queries/audit/audit-log';
import { lockForTransaction } from '../../queries/locks/advisory-locks';
import { markPlanAccepted, selectPlanRow } from '../../queries/plans/plan-rows';
import { setWindowStatus } from '../windows/set-window-status';
import { inventoryCacheFor } from '../inventory/inventory-cache';
import { checkOutageAccepted, checkStillFits } from './accept-checks';
import { PlanAlreadyAcceptedError, PlanNotAcceptableError, PlanNotFoundError, WindowNotPlannableError } from './errors';
import { isStale, loadWindowFacts } from './plan-view';

/**
 * Accepting the window's accepted plan again (a retry, a double click) changes nothing and answers as the first
 * did; accepting another run of a `planned` window must name the accepted plan it replaces (`replacesPlanId`), so
 * two people (or two requests) accepting different runs at once cannot silently overwrite each other. A
 * `returned` window's plan was sent back, so a new run replaces it without naming it.
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
    // Checked under the window's row lock, so of parallel accepts of one window's runs only the first wins.
    if (w.status === 'planned' && w.acceptedPlanId === planId) return;
    if (w.status === 'planned' && w.acceptedPlanId !== null && body.replacesPlanId !== w.acceptedPlanId) {
      throw new PlanAlreadyAcceptedError(w.acceptedPlanId);
    }
    const review = planReviewSchema.parse(row.result);
    const outageAccepted = checkOutageAccepted(review, body.outageAccepted);
    const reservedFor = await checkStillFits(tx, row.windowId, review, inventoryCacheFor(db));
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
