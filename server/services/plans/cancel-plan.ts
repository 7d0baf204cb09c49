// Cancels a queued or running plan run: the row says `cancelled` at once; the worker stops when it sees that.
import type { Db } from '../../../db/client';
import type { Me } from '../../../shared/api';
import { insertAuditEntry } from '../../queries/audit/audit-log';
import { endPlanRun, selectPlanRow } from '../../queries/plans/plan-rows';
import type { PlanQueue } from '../ports';
import { PlanNotCancellableError, PlanNotFoundError } from './errors';

export async function cancelPlan(deps: { db: Db; jobs: PlanQueue; now: Date }, planId: string, user: Me): Promise<void> {
  const { db, now } = deps;
  const jobId = await db.transaction(async (tx) => {
    const row = await selectPlanRow(tx, planId, { forUpdate: true });
    if (!row) throw new PlanNotFoundError(planId);
    if (row.status !== 'queued' && row.status !== 'running') throw new PlanNotCancellableError(row.status);
    const error = `Cancelled by ${user.name}`;
    await endPlanRun(tx, planId, { from: ['queued', 'running'], to: 'cancelled', error, now });
    await insertAuditEntry(tx, {
      actorId: user.id, action: 'plan.cancel', entity: 'plan', entityId: planId, at: now,
      before: { status: row.status }, after: { status: 'cancelled', error },
    });
    return row.jobId;
  });
  // The row is the source of truth: a worker already computing polls it and stops, so a queue that cannot
  // cancel the job (or has already handed it out) changes nothing the planner sees.
  if (jobId) await deps.jobs.cancelPlanRun(jobId).catch(() => undefined);
}
