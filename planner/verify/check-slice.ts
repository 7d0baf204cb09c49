// Checks one slice's planned placement on its own: completeness, fixed functions, anchors, down elements, paths, SLA.
import type { Inventory, Outcome, SlicePlacement, SlicePlan } from '../model/types';
import { anchorHolds } from './anchor-holds';
import type { Violation } from './violation';
import type { WindowLimits } from './window-limits';

/** Latency and availability sums are compared with the same small slack as capacities. */
const SLA_TOLERANCE = 1e-9;

type Report = (code: string, message: string) => void;

function resolveSites(inv: Inventory, s: number, plan: SlicePlan, report: Report): number[] | null {
  let ok = true;
  const sites = inv.slices[s].functions.map((f) => {
    const siteId = plan.sites[f.id];
    const site = siteId === undefined ? undefined : inv.network.siteIndex.get(siteId);
    if (siteId === undefined) report('missing-function', `function "${f.id}" has no site`);
    else if (site === undefined) report('unknown-element', `function "${f.id}" is on unknown site "${siteId}"`);
    if (site === undefined) ok = false;
    return site ?? -1;
  });
  return ok ? sites : null;
}

function resolvePaths(inv: Inventory, s: number, plan: SlicePlan, report: Report): number[][] | null {
  let ok = true;
  const paths = inv.slices[s].ties.map((t) => {
    const ids = plan.paths[t.id];
    if (ids === undefined) {
      report('missing-tie', `tie "${t.id}" has no path`);
      ok = false;
      return [];
    }
    return ids.map((id) => {
      const span = inv.network.spanIndex.get(id);
      if (span === undefined) {
        report('unknown-element', `tie "${t.id}" uses unknown span "${id}"`);
        ok = false;
      }
      return span ?? -1;
    });
  });
  return ok ? paths : null;
}

function checkFunctions(inv: Inventory, s: number, sites: number[], limits: WindowLimits, report: Report): void {
  const current = inv.placements[s].sites;
  inv.slices[s].functions.forEach((f, i) => {
    const siteId = inv.network.sites[sites[i]].id;
    if (f.fixed && sites[i] !== current[i]) report('fixed-moved', `fixed function "${f.id}" moved to "${siteId}"`);
    if (!anchorHolds(inv.network, f.anchor, sites[i])) report('anchor', `function "${f.id}" on "${siteId}" breaks its anchor`);
    if (limits.siteDown[sites[i]]) report('down-element', `function "${f.id}" is on site "${siteId}", down in the window`);
  });
}

function checkTie(inv: Inventory, s: number, t: number, placement: SlicePlacement, limits: WindowLimits, report: Report): void {
  const tie = inv.slices[s].ties[t];
  const { spans, sites } = inv.network;
  let at = placement.sites[tie.from];
  let latencyMs = 0;
  let availability = 1;
  for (const x of placement.paths[t]) {
    const span = spans[x];
    if (limits.spanDown[x]) report('down-element', `tie "${tie.id}" uses span "${span.id}", down in the window`);
    if (span.a !== at && span.b !== at) {
      report('broken-path', `tie "${tie.id}": span "${span.id}" does not touch site "${sites[at].id}"`);
      return;
    }
    at = span.a === at ? span.b : span.a;
    latencyMs += span.latencyMs;
    availability *= span.availability;
  }
  const to = placement.sites[tie.to];
  if (at !== to) report('broken-path', `tie "${tie.id}" ends at "${sites[at].id}", not at "${sites[to].id}"`);
  if (latencyMs > tie.maxLatencyMs * (1 + SLA_TOLERANCE)) {
    report('latency', `tie "${tie.id}" path ${latencyMs.toFixed(3)} ms exceeds budget ${tie.maxLatencyMs} ms`);
  }
  if (tie.minAvailability !== undefined && availability < tie.minAvailability * (1 - SLA_TOLERANCE)) {
    report('availability', `tie "${tie.id}" path availability ${availability} is below ${tie.minAvailability}`);
  }
}

const samePath = (a: readonly number[], b: readonly number[]) => a.length === b.length && a.every((x, i) => x === b[i]);

/** The verifier's own reading of an outcome: 'move' if any function changed site, else 'reroute' if any path changed. */
function actualOutcome(inv: Inventory, s: number, placement: SlicePlacement): Outcome {
  const current = inv.placements[s];
  if (placement.sites.some((site, i) => site !== current.sites[i])) return 'move';
  if (placement.paths.some((path, i) => !samePath(path, current.paths[i]))) return 'reroute';
  return 'stays';
}

/** Checks one entry; returns its placement (null when unresolved or not mappable) for the capacity tally. */
export function checkSlice(
  inv: Inventory, s: number, plan: SlicePlan, limits: WindowLimits, out: Violation[],
): SlicePlacement | null {
  const report: Report = (code, message) => out.push({ slice: plan.slice, code, message });
  if (plan.outcome === 'unresolved') return null;
  const sites = resolveSites(inv, s, plan, report);
  const paths = resolvePaths(inv, s, plan, report);
  if (sites === null || paths === null) return null;
  const placement = { sites, paths };
  checkFunctions(inv, s, sites, limits, report);
  inv.slices[s].ties.forEach((_, t) => checkTie(inv, s, t, placement, limits, report));
  const actual = actualOutcome(inv, s, placement);
  if (actual !== plan.outcome) report('outcome-mismatch', `declared "${plan.outcome}" but the placement is "${actual}"`);
  return placement;
}
