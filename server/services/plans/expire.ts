// How long a plan run may hold its queue job before the queue assumes the worker died and retries it.
import type { PlanSettings } from '../../../shared/plans';
import type { ServerConfig } from '../../env';

/** The DE search gets its time limit; the greedy and exact references run after it (up to about twice as long
 * again), plus a minute of set-up and the operator's margin. The plan worker uses the same number. */
export function planExpireSeconds(
  settings: Pick<PlanSettings, 'timeLimitSeconds'>,
  config: Pick<ServerConfig, 'planExpireMarginSeconds'>,
): number {
  return Math.ceil(settings.timeLimitSeconds * 3) + 60 + config.planExpireMarginSeconds;
}
