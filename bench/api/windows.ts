// The windows the bench books through the API, some weeks ahead (past every tenant's notice period): one on the
// busiest site, one overlapping it in time on a span next to that site, and the plan window on another night.
import type { WindowImpact } from '../../shared/window-impact';
import type { WindowMutation } from '../../shared/windows';
import type { ApiClient } from './client';
import type { WindowTargets } from './network';

const DAY_MS = 24 * 60 * 60 * 1000;
const HOUR_MS = 60 * 60 * 1000;
const DAYS_AHEAD = 45;

export type BenchWindows = { busiest: string; overlapping: string; plan: string; planTouched: number; busiestTouched: number };

/** 22:00 UTC `days` from today, plus `hours`. */
function nightAt(days: number, hours = 0): Date {
  const midnight = new Date();
  midnight.setUTCHours(0, 0, 0, 0);
  return new Date(midnight.getTime() + days * DAY_MS + 22 * HOUR_MS + hours * HOUR_MS);
}

async function book(planner: ApiClient, title: string, start: Date, element: { kind: 'site' | 'span'; id: string }): Promise<string> {
  const answer = await planner.json<WindowMutation>('POST', '/api/windows', {
    title, startsAt: start.toISOString(), endsAt: new Date(start.getTime() + 4 * HOUR_MS).toISOString(),
    workType: 'Bench', elements: [{ ...element, effect: 'down' }],
  });
  return answer.window.id;
}

export async function assess(planner: ApiClient, windowId: string): Promise<WindowImpact> {
  return planner.json<WindowImpact>('POST', `/api/windows/${encodeURIComponent(windowId)}/assess`, {});
}

export async function bookWindows(planner: ApiClient, targets: WindowTargets): Promise<BenchWindows> {
  const busiest = await book(planner, `Power work at ${targets.busiestSite.name}`, nightAt(DAYS_AHEAD), { kind: 'site', id: targets.busiestSite.id });
  const overlapping = await book(planner, 'Fibre splice next to the busiest site', nightAt(DAYS_AHEAD, 1), { kind: 'span', id: targets.nextSpan });
  const plan = await book(planner, `Rack swap at ${targets.planSite.name}`, nightAt(DAYS_AHEAD + 2), { kind: 'site', id: targets.planSite.id });
  const busiestTouched = (await assess(planner, busiest)).affected.length;
  const planTouched = (await assess(planner, plan)).affected.length;
  return { busiest, overlapping, plan, busiestTouched, planTouched };
}

/** The list's time range: from now to a week after the bench's windows. */
export function windowListRange(): { from: string; to: string } {
  return { from: new Date().toISOString(), to: nightAt(DAYS_AHEAD + 7).toISOString() };
}
