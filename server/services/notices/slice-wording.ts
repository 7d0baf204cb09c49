// One slice of an accepted plan in tenant-facing words: what moves, how far, what it does to latency, why an
// untouched slice moves (knock-on), and the expected effect. Never names the operator's sites or spans (they are
// internal).
import { greatCircleKm, type LatLon } from '../../../planner/geo/great-circle';
import type { NoticeSlice } from '../../../shared/notices';
import type { PlanSlice } from '../../../shared/plans';

export type NoticeLookups = {
  sites: Map<string, LatLon>;
  spanLatencyMs: Map<string, number>;
  functionNames: Map<string, string>;
  ties: Map<string, { from: string; to: string; maxLatencyMs: number }>;
};

const HITLESS = 'Hitless: the new placement carries traffic before the old one is released (make-before-break).';

function km(value: number): string {
  return value >= 10 ? `${Math.round(value)} km` : `${value.toFixed(1)} km`;
}

/** Two decimals below 1 ms, where one would round short paths to "0.0 ms". */
function ms(value: number): string {
  return `${value.toFixed(value < 1 ? 2 : 1)} ms`;
}

function fnName(id: string, look: NoticeLookups): string {
  return `"${look.functionNames.get(id) ?? id}"`;
}

function moveLine(m: PlanSlice['moves'][number], look: NoticeLookups): string {
  const from = look.sites.get(m.from);
  const to = look.sites.get(m.to);
  if (!from || !to) return `Function ${fnName(m.function, look)} moves to another site.`;
  const distanceKm = greatCircleKm(from, to);
  const where = distanceKm < 0.5 ? 'another site at the same location' : `another site ${km(distanceKm)} away`;
  return `Function ${fnName(m.function, look)} moves to ${where}.`;
}

function pathLatencyMs(path: string[], look: NoticeLookups): number {
  return path.reduce((sum, span) => sum + (look.spanLatencyMs.get(span) ?? 0), 0);
}

function rerouteLine(r: PlanSlice['reroutes'][number], look: NoticeLookups): string {
  const tie = look.ties.get(r.tie);
  const link = tie ? `The link between ${fnName(tie.from, look)} and ${fnName(tie.to, look)}` : 'One of its links';
  const latency = `latency ${ms(pathLatencyMs(r.from, look))} → ${ms(pathLatencyMs(r.to, look))}`;
  const budget = tie ? `, within its ${ms(tie.maxLatencyMs)} budget` : '';
  // Both ends now on one site: the link no longer crosses the network at all.
  const how = r.to.length === 0 ? 'no longer crosses the network (both ends share a site)' : 'is rerouted on a different path';
  return `${link} ${how}; ${latency}${budget}.`;
}

function staysLines(s: PlanSlice): string[] {
  const lines = ['Stays where it is; nothing of it moves.'];
  if (s.reasons.includes('unprotected')) {
    lines.push('Its backup path is unavailable during the work, so it runs without that protection for the duration.');
  }
  if (s.reasons.includes('squeezed')) lines.push('It runs on equipment with reduced capacity; its reserved capacity still fits.');
  return lines;
}

/**
 * A knock-on move: the work does not touch this slice, it moves to make room. Only this tenant's own slices are
 * named (`own`: their ids); another tenant's slices are "other services" — tenants never learn each other's slices.
 */
function knockOnLine(s: PlanSlice, own: ReadonlySet<string>): string {
  const ours = s.madeRoomFor.filter((m) => own.has(m.slice)).map((m) => `"${m.name}"`);
  const others = s.madeRoomFor.length > ours.length;
  const yours = ours.length === 0 ? '' : `your ${ours.length === 1 ? 'slice' : 'slices'} ${ours.join(', ')}`;
  const forWhom = [yours, others ? 'other services' : ''].filter(Boolean).join(' and ');
  const verb = s.outcome === 'reroute' ? 'rerouted' : 'moved';
  return `The planned work does not touch this slice itself; it is ${verb} to make room for ${forWhom} during the work.`;
}

/**
 * `whenText` is the window's time range as the notice shows it (for the interruption sentence); `own` the ids of
 * this tenant's slices in the plan.
 */
export function describeSlice(
  s: PlanSlice, look: NoticeLookups, outageAccepted: Set<string>, whenText: string, own: ReadonlySet<string> = new Set(),
): NoticeSlice {
  const base = { slice: s.slice, name: s.name, critical: s.critical, outcome: s.outcome };
  if (s.outcome === 'unresolved') {
    const accepted = outageAccepted.has(s.slice) ? 'The operator has accepted this outage. ' : '';
    return {
      ...base,
      changes: ['No alternative placement fits during the work.'],
      effect: 'interruption',
      effectText: `Interruption: ${accepted}Expect the slice to be unavailable for the whole window, ${whenText}.`,
    };
  }
  if (s.outcome === 'stays') {
    return { ...base, changes: staysLines(s), effect: 'none', effectText: 'No interruption expected.' };
  }
  const changes = [...s.moves.map((m) => moveLine(m, look)), ...s.reroutes.map((r) => rerouteLine(r, look))];
  if ((s.madeRoomFor ?? []).length > 0) changes.unshift(knockOnLine(s, own));
  return { ...base, changes, effect: 'hitless', effectText: HITLESS };
}
