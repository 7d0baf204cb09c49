// Plan-run jobs that used up their retries land on the dead-letter queue: their plans are marked failed with a
// reason a planner can read, so no run stays `queued` or `running` for ever.
import type { Db } from '../../db/client';
import { endPlanRun } from '../queries/plans/plan-rows';
import { readRunState } from '../queries/plans/plan-run-rows';

/** pg-boss stores a thrown error as { message, … } and its own reasons as { value: … }. */
function lastMessage(output: unknown): string | null {
  if (!output || typeof output !== 'object') return null;
  const o = output as { message?: unknown; value?: unknown };
  if (typeof o.message === 'string') return o.message;
  if (typeof o.value === 'string') return o.value;
  if (o.value && typeof o.value === 'object') return lastMessage(o.value);
  return null;
}

export function deadRunReason(output: unknown, attempts: number): string {
  const times = attempts === 1 ? 'once' : `${attempts} times`;
  const message = lastMessage(output);
  // pg-boss's expiry of an active job: the worker holding it died, hung or was stopped without notice.
  if (!message || /timeout in active state|handler execution exceeded/.test(message)) {
    return `The worker stopped responding ${times}; the run was given up.`;
  }
  return `The run was tried ${times} and given up; last error: ${message}`;
}

export async function markDeadRun(db: Db, job: { data: { planId?: string }; output?: unknown }, log: (l: string) => void) {
  const planId = job.data?.planId;
  if (!planId) return;
  const state = await readRunState(db, planId);
  if (!state) return;
  // A worker can die between taking the job and marking the row, so the row may count fewer attempts.
  const reason = deadRunReason(job.output, Math.max(1, state.attempts));
  const ended = await endPlanRun(db, planId, { from: ['queued', 'running'], to: 'failed', error: reason, now: new Date() });
  if (ended) log(`plan run ${planId}: failed for good (${reason})`);
}
