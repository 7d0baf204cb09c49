// Output of the command line: the JSON document of the contract, or a readable table.
import type { Objective, PlanResult, SlicePlan } from '../model/types';

const isKnockOn = (s: SlicePlan) => (s.madeRoomFor?.length ?? 0) > 0;

function objectiveDoc(o: Objective): object {
  return {
    unresolved: o.unresolved, moved: o.moved, rerouted: o.rerouted, moveCost: o.moveCost,
    unresolvedWeight: o.unresolvedWeight, usage: o.usage, peakUtilisation: o.peakUtilisation,
  };
}

/**
 * The JSON contract. Knock-on moves (slices the window does not touch, moved to make room) are entries like any
 * other, carrying `madeRoomFor`; `knockOn` lists their ids so a reader need not compare against `affected`.
 */
export function toJsonDocument(r: PlanResult): object {
  return {
    window: r.window,
    mode: r.mode,
    seed: r.seed,
    elapsedMs: Math.round(r.elapsedMs),
    affected: r.affected,
    slices: r.slices.map((s) => ({
      slice: s.slice, outcome: s.outcome, sites: s.sites, paths: s.paths, ...(s.reason ? { reason: s.reason } : {}),
      ...(isKnockOn(s) ? { madeRoomFor: [...s.madeRoomFor!] } : {}),
    })),
    knockOn: r.slices.filter(isKnockOn).map((s) => s.slice),
    objective: objectiveDoc(r.objective),
    ...(r.exact ? { exact: r.exact } : {}),
    ...(r.search ? { search: { objective: objectiveDoc(r.search.objective), feasible: r.search.feasible, usedFallback: r.search.usedFallback } } : {}),
    generations: Math.max(0, r.trace.length - 1),
  };
}

function pad(cells: string[][]): string[] {
  const widths = cells[0].map((_, c) => Math.max(...cells.map((row) => row[c].length)));
  return cells.map((row) => row.map((cell, c) => cell.padEnd(widths[c])).join('  ').trimEnd());
}

/** Unresolved: why. Otherwise span counts per path, and for a knock-on move the slices it makes room for. */
function detail(s: SlicePlan): string {
  if (s.reason) return s.reason;
  const spans = Object.values(s.paths).map((p) => p.length).join('/') + (s.outcome === 'unresolved' ? '' : ' spans');
  return isKnockOn(s) ? `${spans} · makes room for ${s.madeRoomFor!.join(', ')}` : spans;
}

export function toTable(r: PlanResult): string {
  const o = r.objective;
  const head = [
    `window ${r.window} · mode ${r.mode} · seed ${r.seed} · ${Math.round(r.elapsedMs)} ms`,
    `affected ${r.affected.length} · unresolved ${o.unresolved} · moved ${o.moved} · rerouted ${o.rerouted} · move cost ${o.moveCost}`,
  ];
  const knockOn = r.slices.filter(isKnockOn).length;
  if (knockOn > 0) head.push(`knock-on moves ${knockOn}: slices the window does not touch, moved to make room (marked *)`);
  if (r.search?.usedFallback) {
    const so = r.search.objective;
    head.push(`search alone: ${r.search.feasible ? '' : 'infeasible · '}unresolved ${so.unresolved} · move cost ${so.moveCost}; kept the ${r.search.usedFallback} plan instead`);
  }
  if (r.exact) head.push(`exact: ${r.exact.optimal ? 'proven optimal' : `gap ${(100 * r.exact.gap).toFixed(2)} % to bound ${r.exact.bound}`}`);
  if (r.slices.length === 0) return [...head, 'nothing to plan: the window touches no slice'].join('\n');
  const rows = r.slices.map((s) => [
    isKnockOn(s) ? `${s.slice} *` : s.slice, s.outcome,
    // Function ids often repeat the slice id ("slice-7.f1"); the table shows the part that differs.
    Object.entries(s.sites).map(([f, site]) => `${f.startsWith(`${s.slice}.`) ? f.slice(s.slice.length + 1) : f}→${site}`).join(' '),
    detail(s),
  ]);
  return [...head, '', ...pad([['slice', 'outcome', 'sites', 'paths / reason'], ...rows])].join('\n');
}
