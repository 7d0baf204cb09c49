// The change-board pack of one window: the window, its MOP, impact counts, the accepted plan's moves and steps,
// references, risk, decisions and comments — everything by name, for the printable page and the moves CSV.
import type { Db } from '../../../db/client';
import type { ChangePack } from '../../../shared/change-pack';
import { touchCounts, touchedFromImpact } from '../../../shared/touch-counts';
import { selectSiteNames, selectSpanEnds, selectTenantNames } from '../../queries/signoff/element-names';
import { selectFunctionNames, selectTieEnds } from '../../queries/pack/slice-parts';
import { getWindowImpact } from '../../queries/windows/impacts';
import { getUsersByIds } from '../../queries/auth/users';
import { selectPlanRow } from '../../queries/plans/plan-rows';
import { planSettingsSchema } from '../../../shared/plans';
import { listDecisions, loadSignoffContext, type AcceptedPlan } from '../signoff/signoff-context';
import { impactTouches, namedElements } from '../signoff/summary-parts';
import { windowHistory } from '../windows/window-history';
import { loadWindow } from '../windows/window-view';
import { packNames, type PackNames } from './pack-names';
import { idsToName, packSteps } from './pack-steps';

/** Every name the plan's steps and slices need, looked up once per table. */
async function namesFor(db: Db, plan: AcceptedPlan): Promise<PackNames> {
  const ids = idsToName(plan.review);
  const [spanEnds, tieEnds, tenants] = await Promise.all([
    selectSpanEnds(db, ids.spans), selectTieEnds(db, ids.ties), selectTenantNames(db, ids.tenants),
  ]);
  const siteIds = [...ids.sites, ...spanEnds.flatMap((s) => [s.a, s.b])];
  const fnIds = [...ids.functions, ...[...tieEnds.values()].flatMap((t) => [t.from, t.to])];
  const [sites, functions] = await Promise.all([selectSiteNames(db, [...new Set(siteIds)]), selectFunctionNames(db, [...new Set(fnIds)])]);
  return packNames({
    sites, functions, tieEnds, tenants,
    spanEnds: new Map(spanEnds.map((s) => [s.id, { a: s.a, b: s.b }])),
    slices: new Map(plan.review.slices.map((s) => [s.slice, s.name])),
  });
}

/** What happens after the window (the run's setting); `return`, the setting's default, when it does not read. */
async function afterWindowOf(db: Db, planId: string): Promise<'return' | 'keep'> {
  const settings = planSettingsSchema.safeParse((await selectPlanRow(db, planId))?.settings);
  return settings.success ? settings.data.afterWindow : 'return';
}

async function packPlan(db: Db, plan: AcceptedPlan, afterWindow: 'return' | 'keep'): Promise<NonNullable<ChangePack['plan']>> {
  const names = await namesFor(db, plan);
  const people = await getUsersByIds(db, [plan.acceptedBy]);
  const r = plan.review;
  return {
    acceptedAt: plan.acceptedAt?.toISOString() ?? null,
    acceptedByName: people.get(plan.acceptedBy ?? '')?.name ?? null,
    afterWindow,
    slices: r.slices.map((s) => ({
      name: s.name, tenantName: names.tenant(s.tenantId), outcome: s.outcome, critical: s.critical,
      unresolvedReason: s.unresolvedReason, outageAccepted: plan.outageAccepted.includes(s.slice),
      madeRoomFor: s.madeRoomFor.map((m) => m.name),
    })),
    steps: packSteps(r, names),
    needsSpare: r.needsSpare,
    references: { objective: r.objective, computeMs: r.computeMs, search: r.search, greedy: r.greedy, exact: r.exact },
    risk: r.risk.map((x) => ({ sliceName: names.slice(x.slice), severity: x.severity, failureProbability: x.failureProbability, unprotected: x.unprotected })),
    criticalSlices: r.slices.filter((s) => s.critical).map((s) => s.name),
  };
}

/** Reads on the pool (`Db`): the look-ups run side by side. WINDOW_NOT_FOUND when there is no such window. */
export async function changePack(db: Db, windowId: string, now: Date): Promise<ChangePack> {
  const w = await loadWindow(db, windowId, null);
  const ctx = await loadSignoffContext(db, windowId);
  const [impact, elements, decisions, history, afterWindow] = await Promise.all([
    getWindowImpact(db, windowId), namedElements(db, w.elements), listDecisions(db, windowId), windowHistory(db, windowId),
    ctx.plan ? afterWindowOf(db, ctx.plan.id) : Promise.resolve('return' as const),
  ]);
  const touched = ctx.plan ? impactTouches(impact, ctx.plan.windowVersion) : impact ? touchedFromImpact(impact.affected) : null;
  const planSlices = ctx.plan?.review.slices ?? null;
  return {
    window: {
      id: w.id, title: w.title, workType: w.workType, status: w.status,
      startsAt: w.startsAt.toISOString(), endsAt: w.endsAt.toISOString(), ownerName: w.ownerName ?? null,
      elements: elements.map((e) => ({ kind: e.kind, name: e.name, effect: e.effect, fraction: e.fraction })),
    },
    mop: w.mopFileName ? { fileName: w.mopFileName } : null,
    touch: touched || planSlices ? touchCounts(touched, planSlices) : null,
    plan: ctx.plan ? await packPlan(db, ctx.plan, afterWindow) : null,
    decisions: decisions.map((d) => ({
      round: d.round, approverName: d.approver.name, decision: d.decision, comment: d.comment,
      codeConfirmed: d.codeConfirmed, decidedAt: d.decidedAt,
    })),
    // Decisions already carry their comments above; the rest are reasons given along the way (returns, lifecycle steps).
    comments: history.events.filter((e) => e.comment !== null && e.kind !== 'approved' && e.kind !== 'sent-back'),
    generatedAt: now.toISOString(),
  };
}
