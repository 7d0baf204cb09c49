// How long a plan run may hold its queue job before the queue presumes its worker dead and retries the job.
import type { PlanSettings } from '../../../shared/plans';
import type { ServerConfig } from '../../env';

/**
 * The longest a healthy run takes, plus headroom: the search stops at its time limit, the greedy and exact
 * references that follow take up to about twice as long again (hence × 3), setting up (reading the inventory,
 * starting the thread) gets a minute, and PLAN_EXPIRE_MARGIN_SECONDS is the operator's extra. Too short, and a
 * run still computing is retried beside itself; too long, and a crashed run waits longer for its retry (the
 * heartbeat sweep usually notices sooner). Enqueueing and the sweeper's fresh job both use this figure, and the
 * worker stops a run's thread just before it.
 */
export function planExpireSeconds(
  settings: Pick<PlanSettings, 'timeLimitSeconds'>,
  config: Pick<ServerConfig, 'planExpireMarginSeconds'>,
): number {
  return Math.ceil(settings.timeLimitSeconds * 3) + 60 + config.planExpireMarginSeconds;
}
