// Puts an accepted plan into the placement history: its placements become current when the window starts;
// `return` (and a roll-back) restores the ones from before as a further revision when it ends (DESIGN §4.3).
import { planReviewSchema, planSettingsSchema, type PlacementView, type PlanSlice } from '../../../shared/plans';
import type { WindowStatus } from '../../../shared/windows';
import { insertAuditEntry } from '../../queries/audit/audit-log';
import type { Queryable } from '../../../db/client';
import { insertCurrentPlacement, lockLatestPlacementRevision, retireCurrentPlacement } from '../../queries/plans/placement-revisions';
import { selectPlanRow } from '../../queries/plans/plan-rows';
import { selectAcceptedPlanId } from '../../queries/plans/plan-window';

type Change = { windowId: string; from: WindowStatus; to: WindowStatus; actorId: string | null; now: Date };
type Revision = { sliceId: string; placement: PlacementView; reason: string; action: string; actorId: string | null; now: Date };

/** Writes the next revision of one slice's placement and makes it the current one; false when the slice is gone. */
export async function writePlacementRevision(tx: Queryable, r: Revision): Promise<boolean> {
  const latest = await lockLatestPlacementRevision(tx, r.sliceId);
  if (latest === null) return false;
  const current = await retireCurrentPlacement(tx, r.sliceId);
  const revision = latest + 1;
  await insertCurrentPlacement(tx, {
    sliceId: r.sliceId, revision, sites: r.placement.sites, paths: r.placement.paths,
    reason: r.reason, createdBy: r.actorId, createdAt: r.now,
  });
  await insertAuditEntry(tx, {
    actorId: r.actorId, action: r.action, entity: 'slice', entityId: r.sliceId, at: r.now,
    before: { revision: current }, after: { revision, reason: r.reason, sites: r.placement.sites, paths: r.placement.paths },
  });
  return true;
}

/** The window's accepted plan: the slices it moves or reroutes, and what happens after the window. */
async function acceptedPlan(tx: Queryable, windowId: string) {
  const planId = await selectAcceptedPlanId(tx, windowId);
  if (!planId) return null;
  const row = await selectPlanRow(tx, planId);
  if (!row || row.status !== 'done') return null;
  const changed = planReviewSchema.parse(row.result).slices
    .filter((s): s is PlanSlice & { after: PlacementView } => (s.outcome === 'move' || s.outcome === 'reroute') && s.after !== null);
  return { id: row.id, afterWindow: planSettingsSchema.parse(row.settings).afterWindow, changed };
}

/** Call inside the transaction that changes the window's status; returns how many revisions it wrote. */
export async function applyPlanPlacements(tx: Queryable, c: Change): Promise<number> {
  const starts = c.from === 'notified' && c.to === 'underway';
  const ends = c.from === 'underway' && (c.to === 'done' || c.to === 'rolled-back');
  if (!starts && !ends) return 0;
  const plan = await acceptedPlan(tx, c.windowId);
  if (!plan) return 0;
  // `keep`: the plan's placements simply stay current after the window.
  if (c.to === 'done' && plan.afterWindow === 'keep') return 0;
  const action = starts ? 'placement.plan-apply' : c.to === 'done' ? 'placement.plan-return' : 'placement.plan-rollback';
  const reason = starts ? `plan:${plan.id}` : `plan:${plan.id}:${c.to === 'done' ? 'return' : 'rollback'}`;
  let written = 0;
  for (const s of plan.changed) {
    const placement = starts ? s.after : s.before;
    if (await writePlacementRevision(tx, { sliceId: s.slice, placement, reason, action, actorId: c.actorId, now: c.now })) written += 1;
  }
  return written;
}
