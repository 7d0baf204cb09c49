// Starts a plan run: checks the window and the settings, stores the run as `queued` and hands it to the job queue.
import { randomBytes } from 'node:crypto';
import type { Db } from '../../../db/client';
import type { Me } from '../../../shared/api';
import type { PlanSettings } from '../../../shared/plans';
import { PLANNABLE_STATES } from '../../../shared/permissions';
import type { ServerConfig } from '../../env';
import type { PlanQueue } from '../ports';
import { insertAuditEntry } from '../../queries/audit/audit-log';
import { selectExistingFunctionIds, selectExistingSiteIds } from '../../queries/plans/plan-inputs';
import { endPlanRun, insertPlanRow, setPlanJobId } from '../../queries/plans/plan-rows';
import { checkWaitingJobs } from '../job-limits/check-waiting-jobs';
import { ImpactNotCurrentError, QueueUnavailableError, UnknownPlanInputsError, WindowNotPlannableError } from './errors';
import { planExpireSeconds } from './expire';
import { loadWindowFacts } from './plan-view';

export type EnqueueDeps = { db: Db; jobs: PlanQueue; config: ServerConfig; now: Date };

export const newPlanId = () => `pl-${randomBytes(9).toString('base64url')}`;

async function checkSettings(db: Db, settings: PlanSettings): Promise<void> {
  const functions = await selectExistingFunctionIds(db, settings.pinned);
  const siteIds = await selectExistingSiteIds(db, settings.excludedSites);
  const unknownFunctions = [...new Set(settings.pinned.filter((id) => !functions.has(id)))];
  const unknownSites = [...new Set(settings.excludedSites.filter((id) => !siteIds.has(id)))];
  if (unknownFunctions.length + unknownSites.length > 0) throw new UnknownPlanInputsError(unknownFunctions, unknownSites);
}

export async function enqueuePlan(deps: EnqueueDeps, windowId: string, settings: PlanSettings, user: Me): Promise<string> {
  const { db, now } = deps;
  const w = await loadWindowFacts(db, windowId);
  if (!PLANNABLE_STATES.includes(w.status)) throw new WindowNotPlannableError(w.status);
  if (w.impactVersion === null) throw new ImpactNotCurrentError();
  await checkSettings(db, settings);
  const id = newPlanId();
  // Committed before the job is sent: a worker that picks the job up at once must find the row.
  await db.transaction(async (tx) => {
    // A person over the cap of unfinished runs gets 429 and nothing is stored.
    await checkWaitingJobs(tx, deps.config.waitingJobLimits, 'planRuns', user.id);
    await insertPlanRow(tx, { id, windowId, windowVersion: w.version, settings, createdBy: user.id, now });
    await insertAuditEntry(tx, {
      actorId: user.id, action: 'plan.enqueue', entity: 'plan', entityId: id, at: now,
      before: null, after: { status: 'queued', windowId, windowVersion: w.version, settings },
    });
  });
  await sendRun(deps, id, settings, user);
  return id;
}

/** A run the queue never took must not wait as `queued` forever: it is marked failed with the reason. */
async function sendRun(deps: EnqueueDeps, id: string, settings: PlanSettings, user: Me): Promise<void> {
  let jobId: string;
  try {
    jobId = await deps.jobs.sendPlanRun(id, { expireInSeconds: planExpireSeconds(settings, deps.config) });
  } catch (err) {
    const reason = err instanceof Error ? err.message : String(err);
    const error = `The job queue did not take the run: ${reason}`;
    await deps.db.transaction(async (tx) => {
      await endPlanRun(tx, id, { from: ['queued'], to: 'failed', error, now: deps.now });
      await insertAuditEntry(tx, {
        actorId: user.id, action: 'plan.fail', entity: 'plan', entityId: id, at: deps.now,
        before: { status: 'queued' }, after: { status: 'failed', error },
      });
    });
    throw new QueueUnavailableError(reason);
  }
  await setPlanJobId(deps.db, id, jobId);
}
