// Output of the command line: the JSON document of the contract, or a readable table.
import type { PlanResult } from '../model/types';

export function toJsonDocument(r: PlanResult): object {
  return {
    window: r.window,
    mode: r.mode,
    seed: r.seed,
    elapsedMs: Math.round(r.elapsedMs),
    affected: r.affected,
    slices: r.slices.map((s) => ({
      slice: s.slice, outcome: s.outcome, sites: s.sites, paths: s.paths, ...(s.reason ? { reason: s.reason } : {}),
    })),
    objective: {
      unresolved: r.objective.unresolved,
      moved: r.objective.moved,
      rerouted: r.objective.rerouted,
      moveCost: r.objective.moveCost,
      unresolvedWeight: r.objective.unresolvedWeight,
      usage: r.objective.usage,
      peakUtilisation: r.objective.peakUtilisation,
    },
    ...(r.exact ? { exact: r.exact } : {}),
    generations: Math.max(0, r.trace.length - 1),
  };
}

function pad(cells: string[][]): string[] {
  const widths = cells[0].map((_, c) => Math.max(...cells.map((row) => row[c].length)));
  return cells.map((row) => row.map((cell, c) => cell.padEnd(widths[c])).join('  ').trimEnd());
}

export function toTable(r: PlanResult): string {
  const o = r.objective;
  const head = [
    `window ${r.window} · mode ${r.mode} · seed ${r.seed} · ${Math.round(r.elapsedMs)} ms`,
    `affected ${r.affected.length} · unresolved ${o.unresolved} · moved ${o.moved} · rerouted ${o.rerouted} · move cost ${o.moveCost}`,
  ];
  if (r.exact) head.push(`exact: ${r.exact.optimal ? 'proven optimal' : `gap ${(100 * r.exact.gap).toFixed(2)} % to bound ${r.exact.bound}`}`);
  if (r.slices.length === 0) return [...head, 'nothing to plan: the window touches no slice'].join('\n');
  const rows = r.slices.map((s) => [
    s.slice, s.outcome,
    // Function ids often repeat the slice id ("slice-7.f1"); the table shows the part that differs.
    Object.entries(s.sites).map(([f, site]) => `${f.startsWith(`${s.slice}.`) ? f.slice(s.slice.length + 1) : f}→${site}`).join(' '),
    s.reason ?? Object.values(s.paths).map((p) => p.length).join('/') + (s.outcome === 'unresolved' ? '' : ' spans'),
  ]);
  return [...head, '', ...pad([['slice', 'outcome', 'sites', 'paths / reason'], ...rows])].join('\n');
}
