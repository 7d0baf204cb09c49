// Pieces of the one-screen summary worked out from the accepted plan's review: tenants, unresolved slices, risks.
import type { PlanReview } from '../../../shared/plans';
import type { SignoffSummary } from '../../../shared/signoff';
import { selectSiteNames, selectSpanEnds } from '../../queries/signoff/element-names';
import type { ElementRow } from '../../queries/windows/window-rows';
import type { Queryable } from '../../../db/client';

const SEVERITY_RANK = { low: 0, medium: 1, high: 2, critical: 3 } as const;
/** A phone screen shows a handful; the full plan (one tap away) lists every slice's risk. */
const HIGHEST_RISKS_SHOWN = 5;

type Slice = PlanReview['slices'][number];
const moving = (s: Slice) => s.outcome === 'move' || s.outcome === 'reroute';
/** A slice the window does not touch, moved to make room for affected ones. */
const isKnockOn = (s: Slice) => s.madeRoomFor.length > 0;

/** Tenants with moving slices first; knock-on moves count apart from the affected slices. */
export function tenantCounts(review: PlanReview, names: Map<string, string>): SignoffSummary['tenants'] {
  const byTenant = new Map<string, { affected: number; moving: number; knockOn: number }>();
  for (const s of review.slices) {
    const entry = byTenant.get(s.tenantId) ?? { affected: 0, moving: 0, knockOn: 0 };
    if (isKnockOn(s)) entry.knockOn += 1;
    else {
      entry.affected += 1;
      if (moving(s)) entry.moving += 1;
    }
    byTenant.set(s.tenantId, entry);
  }
  return [...byTenant].map(([id, c]) => ({ id, name: names.get(id) ?? id, ...c }))
    .sort((a, b) => b.moving + b.knockOn - (a.moving + a.knockOn) || a.name.localeCompare(b.name));
}

export function planTotals(review: PlanReview): SignoffSummary['totals'] {
  const touched = review.slices.filter((s) => !isKnockOn(s));
  const count = (f: (s: Slice) => boolean) => touched.filter(f).length;
  return {
    affected: touched.length, moving: count(moving),
    stays: count((s) => s.outcome === 'stays'), unresolved: count((s) => s.outcome === 'unresolved'),
    knockOn: review.slices.length - touched.length,
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

export function highestRisks(review: PlanReview): SignoffSummary['highestRisks'] {
  const sliceName = new Map(review.slices.map((s) => [s.slice, s.name]));
  return [...review.risk]
    .sort((a, b) => SEVERITY_RANK[b.severity] - SEVERITY_RANK[a.severity] || b.failureProbability - a.failureProbability)
    .slice(0, HIGHEST_RISKS_SHOWN)
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
