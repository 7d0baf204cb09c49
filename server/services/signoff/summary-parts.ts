// Pieces of the one-screen summary worked out from the accepted plan's review: tenants, unresolved slices, risks.
import type { PlanReview } from '../../../shared/plans';
import type { SignoffSummary } from '../../../shared/signoff';
import { tenantTouches, touchCounts, touchedFromImpact, type TouchedSlice } from '../../../shared/touch-counts';
import type { WindowImpact } from '../../../shared/window-impact';
import { selectSiteNames, selectSpanEnds } from '../../queries/signoff/element-names';
import type { ElementRow } from '../../queries/windows/window-rows';
import type { Queryable } from '../../../db/client';

const SEVERITY_RANK = { low: 0, medium: 1, high: 2, critical: 3 } as const;

type Slice = PlanReview['slices'][number];
const moving = (s: Slice) => s.outcome === 'move' || s.outcome === 'reroute';
/** A slice the window does not touch, moved to make room for affected ones. */
const isKnockOn = (s: Slice) => s.madeRoomFor.length > 0;

/** The window's touched slices from its stored impact, when it is for the version the plan was computed for. */
export function impactTouches(impact: WindowImpact | null, windowVersion: number | null): TouchedSlice[] | null {
  return impact && impact.windowVersion === windowVersion ? touchedFromImpact(impact.affected) : null;
}

/**
 * Every tenant with a touched slice (including ones that only lose protection, which a plan never lists) or a
 * knock-on move; tenants with moving slices first. Names from the impact, then the tenant table.
 */
export function tenantCounts(review: PlanReview, touched: TouchedSlice[] | null, names: Map<string, string>): SignoffSummary['tenants'] {
  return tenantTouches(touched, review.slices).map((t) => ({
    id: t.tenantId, name: names.get(t.tenantId) ?? t.tenantId, affected: t.touched, moving: t.moving,
    knockOn: t.knockOn, protectionLost: t.protectionLost,
  }));
}

export function planTotals(review: PlanReview, touched: TouchedSlice[] | null): SignoffSummary['totals'] {
  const counts = touchCounts(touched, review.slices);
  const own = review.slices.filter((s) => !isKnockOn(s));
  return {
    affected: counts.touched, moving: own.filter(moving).length,
    stays: counts.touched - own.filter(moving).length - (counts.unresolved ?? 0), unresolved: counts.unresolved ?? 0,
    knockOn: counts.knockOn ?? 0,
  };
}

/** Each knock-on move with the names of the slices it makes room for (approvers read names, not ids). */
export function knockOnMoves(review: PlanReview, names: Map<string, string>): SignoffSummary['knockOn'] {
  return review.slices.filter(isKnockOn).flatMap((s) => (moving(s) ? [{
    slice: s.slice, name: s.name, tenantName: names.get(s.tenantId) ?? s.tenantId,
    outcome: s.outcome as 'move' | 'reroute', madeRoomFor: s.madeRoomFor.map((m) => m.name),
  }] : []));
}

export function unresolvedSlices(review: PlanReview, names: Map<string, string>, outageAccepted: string[]): SignoffSummary['unresolved'] {
  return review.slices.filter((s) => s.outcome === 'unresolved').map((s) => ({
    slice: s.slice, name: s.name, tenantName: names.get(s.tenantId) ?? s.tenantId,
    reason: s.unresolvedReason, outageAccepted: outageAccepted.includes(s.slice),
  }));
}

/** Every slice risk of the plan, worst first; the screen shows the first few and says how many there are. */
export function highestRisks(review: PlanReview): SignoffSummary['highestRisks'] {
  const sliceName = new Map(review.slices.map((s) => [s.slice, s.name]));
  return [...review.risk]
    .sort((a, b) => SEVERITY_RANK[b.severity] - SEVERITY_RANK[a.severity] || b.failureProbability - a.failureProbability)
    .map((r) => ({ ...r, name: sliceName.get(r.slice) ?? r.slice }));
}

/** Sites by name, spans as "A – B" by their end sites' names (spans have no names of their own). */
export async function namedElements(db: Queryable, elements: ElementRow[]): Promise<SignoffSummary['window']['elements']> {
  const spanIds = elements.filter((e) => e.kind === 'span').map((e) => e.id);
  const spanRows = await selectSpanEnds(db, spanIds);
  const siteIds = [...elements.filter((e) => e.kind === 'site').map((e) => e.id), ...spanRows.flatMap((s) => [s.a, s.b])];
  const site = await selectSiteNames(db, siteIds);
  const span = new Map(spanRows.map((s) => [s.id, `${site.get(s.a) ?? s.a} – ${site.get(s.b) ?? s.b}`]));
  return elements.map((e) => ({ ...e, name: (e.kind === 'site' ? site.get(e.id) : span.get(e.id)) ?? e.id }));
}
