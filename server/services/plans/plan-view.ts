// Turns plan rows into the API's shapes (shared/plans.ts), with `stale` and `accepted` judged from the window.
import { eq } from 'drizzle-orm';
import { windowImpacts, windows } from '../../../db/schema';
import {
  planProgressSchema, planReviewSchema, planSettingsSchema, type Plan, type PlanListItem,
} from '../../../shared/plans';
import type { WindowStatus } from '../../../shared/windows';
import type { Queryable } from '../../../db/client';
import { WindowNotFoundError } from '../windows/errors';
import type { PlanRow } from './plan-rows';

/** What a plan's standing depends on: the window's state and the version its stored impact was computed for. */
export type WindowFacts = {
  id: string; status: WindowStatus; version: number; acceptedPlanId: string | null;
  /** null when no impact is stored (an edit dropped it) */
  impactVersion: number | null;
};

export async function selectWindowFacts(db: Queryable, windowId: string, opts: { forUpdate?: boolean } = {}): Promise<WindowFacts> {
  const query = db.select({
    id: windows.id, status: windows.status, version: windows.version, acceptedPlanId: windows.acceptedPlanId,
    impactVersion: windowImpacts.windowVersion,
  }).from(windows).leftJoin(windowImpacts, eq(windowImpacts.windowId, windows.id)).where(eq(windows.id, windowId));
  const [row] = opts.forUpdate ? await query.for('update', { of: windows }) : await query;
  if (!row) throw new WindowNotFoundError(windowId);
  return row;
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
