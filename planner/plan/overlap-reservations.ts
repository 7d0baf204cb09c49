// Capacity promised to the accepted plans of windows that overlap this one in time (DESIGN §4.2), as a Reservation.
//
// Why these amounts — the rule is "never claim the same capacity twice", so every choice errs on the side of reserving more:
// - During the overlap, a slice an accepted plan moved or rerouted sits on its NEW placement. The parts of that
//   placement equal to today's (functions that stay, ties on the same path, spans both paths share) are already
//   counted: this run subtracts today's load of every slice it does not re-place. So only what the plan ADDS is
//   reserved: a moved function's vCPU at its new site, a changed tie's Gbit/s on the spans of its new path that
//   the old path did not use (shared-explicit make-before-break, RFC 3209 §2.5 (secondary): spans on both paths
//   are claimed once). What the plan frees (old sites, old spans, unresolved slices) is NOT given back.
//   Reserving the whole new placement instead would count the unchanged parts twice and make busy elements
//   look squeezed, dragging unrelated slices into this run.
// - The other window's elements are out during the overlap too, so nothing of this run may use them: a down
//   site or span (and every span touching a down site) is reserved in full, a reduced one loses the share its
//   window takes away (capacity × (1 − fraction)). Slices that sit on those elements today then count as
//   squeezed in this run and get re-placed away from both windows' elements; their other plan's additions
//   stay reserved as well, which costs spare capacity but can never claim the same capacity twice.
// - Several windows blocking the same element reserve it once (the largest share), not once per window;
//   additions of different plans are summed.
// Ids the inventory no longer knows are skipped: there is no capacity left to promise on them.
import type { Inventory, Reservation, SlicePlan, WindowSpec } from '../model/types';

export interface OverlappingPlan {
  window: WindowSpec;
  /** the accepted plan's slices (id form, as stored) */
  slices: SlicePlan[];
}

interface Tally {
  siteCpu: Map<string, number>;
  spanGbps: Map<string, number>;
}

function add(into: Map<string, number>, id: string, amount: number): void {
  if (amount > 0) into.set(id, (into.get(id) ?? 0) + amount);
}

function keepLargest(into: Map<string, number>, id: string, amount: number): void {
  if (amount > 0) into.set(id, Math.max(into.get(id) ?? 0, amount));
}

/** What one moved or rerouted slice adds on top of its current placement. */
function addPlanAdditions(inv: Inventory, plan: SlicePlan, into: Tally): void {
  if (plan.outcome !== 'move' && plan.outcome !== 'reroute') return;
  const s = inv.sliceIndex.get(plan.slice);
  if (s === undefined) return;
  const slice = inv.slices[s];
  const current = inv.placements[s];
  const { sites, spans, siteIndex, spanIndex } = inv.network;
  slice.functions.forEach((f, i) => {
    const to = plan.sites[f.id];
    if (to !== undefined && siteIndex.has(to) && to !== sites[current.sites[i]].id) add(into.siteCpu, to, f.cpu);
  });
  slice.ties.forEach((t, i) => {
    const old = new Set(current.paths[i].map((x) => spans[x].id));
    // A path that repeats a span claims it each time, as placementLoad does.
    for (const span of plan.paths[t.id] ?? []) {
      if (!old.has(span) && spanIndex.has(span)) add(into.spanGbps, span, t.bandwidthGbps);
    }
  });
}

/** Capacity the other window takes away while it is open: all of a down element, the lost share of a reduced one. */
function addWindowBlock(inv: Inventory, window: WindowSpec, into: Tally): void {
  const { sites, spans, siteIndex, spanIndex } = inv.network;
  const downSites = new Set(window.downSites.filter((id) => siteIndex.has(id)));
  const downSpans = new Set(window.downSpans);
  for (const id of downSites) keepLargest(into.siteCpu, id, sites[siteIndex.get(id)!].cpu);
  for (const span of spans) {
    const down = downSpans.has(span.id) || downSites.has(sites[span.a].id) || downSites.has(sites[span.b].id);
    if (down) keepLargest(into.spanGbps, span.id, span.capacityGbps);
  }
  for (const r of window.reduced) {
    const lost = 1 - Math.min(1, Math.max(0, r.fraction));
    if ('site' in r) {
      if (siteIndex.has(r.site)) keepLargest(into.siteCpu, r.site, sites[siteIndex.get(r.site)!].cpu * lost);
    } else if (spanIndex.has(r.span)) {
      keepLargest(into.spanGbps, r.span, spans[spanIndex.get(r.span)!].capacityGbps * lost);
    }
  }
}

function sortedRecord(map: Map<string, number>): Record<string, number> {
  return Object.fromEntries([...map].sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)));
}

/** The reservation this run must respect because of the other windows' accepted plans. */
export function overlapReservations(inv: Inventory, others: readonly OverlappingPlan[]): Reservation {
  const additions: Tally = { siteCpu: new Map(), spanGbps: new Map() };
  const blocked: Tally = { siteCpu: new Map(), spanGbps: new Map() };
  for (const other of others) {
    for (const plan of other.slices) addPlanAdditions(inv, plan, additions);
    addWindowBlock(inv, other.window, blocked);
  }
  for (const [id, amount] of blocked.siteCpu) add(additions.siteCpu, id, amount);
  for (const [id, amount] of blocked.spanGbps) add(additions.spanGbps, id, amount);
  return { siteCpu: sortedRecord(additions.siteCpu), spanGbps: sortedRecord(additions.spanGbps) };
}
