// A plan's knock-on moves as people read them: untouched slices that moved are kept (stays are dropped), each
// naming the touched slices that now use room it gave up (its old site's vCPU or its old path's spans).
import type { SlicePlacement } from '../model/types';
import type { RemapProblem } from './remap-types';

function samePlacement(a: SlicePlacement, b: SlicePlacement): boolean {
  return a.sites.every((s, i) => s === b.sites[i])
    && a.paths.every((p, i) => p.length === b.paths[i].length && p.every((x, k) => x === b.paths[i][k]));
}

/** Sites and spans a slice gave up by moving from `before` to `after`. */
function freed(before: SlicePlacement, after: SlicePlacement): { sites: Set<number>; spans: Set<number> } {
  const sites = new Set(before.sites.filter((s, i) => s !== after.sites[i]));
  const kept = new Set(after.paths.flat());
  return { sites, spans: new Set(before.paths.flat().filter((x) => !kept.has(x))) };
}

function uses(p: SlicePlacement, room: { sites: Set<number>; spans: Set<number> }): boolean {
  return p.sites.some((s) => room.sites.has(s)) || p.paths.some((path) => path.some((x) => room.spans.has(x)));
}

export interface FinalPlan {
  /** touched slices, and knock-on slices that moved */
  next: Map<number, SlicePlacement | null>;
  /** knock-on slice index → the touched slice indices it made room for */
  madeRoomFor: Map<number, number[]>;
}

/**
 * Drops knock-on candidates that stayed; names, for each that moved, the touched slices using its old room
 * (when none uses it directly, the chain is indirect: every touched slice the plan moved or rerouted).
 */
export function finalPlan(problem: RemapProblem, found: Map<number, SlicePlacement | null>): FinalPlan {
  const next = new Map<number, SlicePlacement | null>();
  const madeRoomFor = new Map<number, number[]>();
  const touched = problem.slices.filter((b) => b.touched).map((b) => b.slice);
  for (const s of touched) next.set(s, found.get(s) ?? null);
  const changedTouched = touched.filter((s) => {
    const p = found.get(s);
    return p && !samePlacement(p, problem.inv.placements[s]);
  });
  for (const block of problem.slices) {
    const p = found.get(block.slice);
    if (block.touched || !p || samePlacement(p, problem.inv.placements[block.slice])) continue;
    next.set(block.slice, p);
    const room = freed(problem.inv.placements[block.slice], p);
    const direct = touched.filter((s) => { const q = found.get(s); return q && uses(q, room); });
    madeRoomFor.set(block.slice, direct.length > 0 ? direct : changedTouched);
  }
  return { next, madeRoomFor };
}
