// The campaign scheduler (planner/campaign) as the slot engine runs it, on whichever thread calls it. Its progress
// ends at the budget: the search stops early once it cannot improve, and a job's progress should then read complete.
import { scheduleCampaign, SCHEDULE_DEFAULTS } from '../../../planner/campaign/schedule-campaign';
import type { CampaignProblem, CampaignSchedule, ScheduleCampaignOptions } from './engine';

export type ScheduleRunOptions = Omit<ScheduleCampaignOptions, 'signal'>;

export const SCHEDULING_STOPPED = 'the scheduling was stopped before it finished';

export function runSchedule(p: CampaignProblem, opts: ScheduleRunOptions = {}): CampaignSchedule {
  const { onProgress } = opts;
  // Absent options take the planner's defaults (a key present but undefined would override them).
  const seed = opts.seed ?? SCHEDULE_DEFAULTS.seed;
  const maxIterations = opts.maxIterations ?? SCHEDULE_DEFAULTS.maxIterations;
  let lastDone = -1;
  const schedule = scheduleCampaign(p, {
    seed, maxIterations,
    onProgress: onProgress && ((done, total) => { lastDone = done; onProgress(done, total); }),
  });
  if (onProgress && lastDone !== maxIterations) onProgress(maxIterations, maxIterations);
  return schedule;
}

/** On the calling thread: nothing can stop it once started, so a stopped job is refused before it starts. */
export async function scheduleInProcess(p: CampaignProblem, opts: ScheduleCampaignOptions = {}): Promise<CampaignSchedule> {
  const { signal, ...rest } = opts;
  if (signal?.aborted) throw new Error(SCHEDULING_STOPPED);
  return runSchedule(p, rest);
}
