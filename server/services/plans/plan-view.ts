// Turns plan rows into the API's shapes (shared/plans.ts), with `stale` and `accepted` judged from the window.
import {
  planProgressSchema, planReviewSchema, planSettingsSchema, type Plan, type PlanListItem,
} from '../../../shared/plans';
import type { Queryable } from '../../../db/client';
import type { PlanRow } from '../../queries/plans/plan-rows';
import { selectWindowFacts, type WindowFacts } from '../../queries/plans/plan-window';
import { WindowNotFoundError } from '../windows/errors';

/** The window's facts; WINDOW_NOT_FOUND when there is no such window. */
export async function loadWindowFacts(db: Queryable, windowId: string, opts: { forUpdate?: boolean } = {}): Promise<WindowFacts> {
  const facts = await selectWindowFacts(db, windowId, opts);
  if (!facts) throw new WindowNotFoundError(windowId);
  return facts;
}

/**
 * A run is stale when the impact it was planned against is gone or was recomputed after it: edits of times or
 * elements drop the impact (and send the window to draft), re-assessing replaces it. Every status change bumps
 * the window's version too (accepting a plan does), so comparing versions alone would call every accepted plan
 * stale; the impact's version only moves when what the plan depends on moves.
 */
export function isStale(row: Pick<PlanRow, 'windowVersion'>, w: WindowFacts): boolean {
  return w.status === 'draft' || w.impactVersion === null || w.impactVersion > row.windowVersion;
}

const iso = (d: Date | null) => (d === null ? null : d.toISOString());

function common(row: PlanRow, w: WindowFacts): Omit<Plan, 'review'> {
  const progress = planProgressSchema.safeParse(row.progress);
  return {
    id: row.id, windowId: row.windowId, windowVersion: row.windowVersion, status: row.status,
    settings: planSettingsSchema.parse(row.settings),
    progress: progress.success ? progress.data : null,
    error: row.error, attempts: row.attempts, createdBy: row.createdBy,
    createdAt: row.createdAt.toISOString(), startedAt: iso(row.startedAt), finishedAt: iso(row.finishedAt),
    stale: isStale(row, w), accepted: w.acceptedPlanId === row.id,
    acceptedAt: iso(row.acceptedAt), outageAccepted: row.outageAccepted ?? [],
  };
}

export function toPlan(row: PlanRow, w: WindowFacts): Plan {
  const review = row.status === 'done' && row.result != null ? planReviewSchema.parse(row.result) : null;
  return { ...common(row, w), review };
}

export function toPlanListItem(row: PlanRow, w: WindowFacts): PlanListItem {
  const totals = row.status === 'done' ? planReviewSchema.shape.totals.safeParse((row.result as { totals?: unknown } | null)?.totals) : null;
  return { ...common(row, w), totals: totals?.success ? totals.data : null };
}
