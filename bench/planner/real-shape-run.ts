// One real-shape window through every solver the (e) rows compare: DE alone with touched slices only, DE alone
// with knock-on moves, greedy, exact with touched slices only and exact with knock-on blocks. DE figures are
// the search's own (`result.search`), never the greedy fallback planWindow may return instead. The serial DE
// run also records its best-so-far over time, which the islands race compares against.
import { exactPlanWindow, type ExactResult } from '../../planner/exact/exact-plan';
import type { Objective, PlanResult } from '../../planner/model/types';
import { computePlan } from '../../planner/plan/compute-plan';
import { PLAN_DEFAULTS } from '../../planner/remap/plan-window';
import type { RealShapeInstance } from './instances';
import { ms } from './report';

/** The planner's own defaults, so the figures are those of the product's settings. */
export const MAX_CANDIDATES = PLAN_DEFAULTS.maxCandidates;
export const MAX_KNOCK_ON_MOVES = PLAN_DEFAULTS.maxKnockOnMoves;

export interface ExactOutcome {
  objective: Objective;
  optimal: boolean;
  complete: boolean;
  ms: number;
}

/** Best-so-far of a DE run, from planWindow's onProgress. */
export interface ProgressPoint {
  ms: number;
  best: Objective;
}

export interface ShapeOutcome {
  label: string;
  sites: number;
  slices: number;
  affected: number;
  peakUtilisation: number;
  gate: string | null;
  /** DE alone, touched slices only */
  de: Objective; deMs: number; deFallback: boolean;
  /** the serial DE's best-so-far over time (touched only), for the islands race */
  deTrace: ProgressPoint[];
  /** DE alone, knock-on moves allowed */
  deKnockOn: Objective; deKnockOnMs: number;
  greedy: Objective; greedyMs: number;
  exact: ExactOutcome;
  exactKnockOn: ExactOutcome;
}

export interface ExactSetting {
  timeLimitMs: number;
  kPaths?: number;
  maxAllPaths?: number;
  allPathsMaxSites?: number;
}

function searchAlone(r: PlanResult): Objective {
  if (!r.search) throw new Error(`planWindow gave no search figures for window ${r.window} in mode ${r.mode}`);
  return r.search.objective;
}

const exactOutcome = (r: ExactResult): ExactOutcome => ({ objective: r.objective, optimal: r.optimal, complete: r.complete, ms: r.elapsedMs });

export async function runShapeWindow(inst: RealShapeInstance, exact: ExactSetting): Promise<ShapeOutcome> {
  const { inv } = inst;
  const w = inst.windows[0];
  // DE modes keep the planner's 30 s time limit and stall stop (PLAN_DEFAULTS); seed 1 as everywhere in the bench.
  const base = { seed: 1, maxCandidates: MAX_CANDIDATES };
  const deTrace: ProgressPoint[] = [];
  const onProgress = (p: { phase: string; best: Objective | null; elapsedMs: number }) => {
    if (p.phase === 'searching' && p.best) deTrace.push({ ms: p.elapsedMs, best: p.best });
  };
  const touched = await computePlan(inst.scenario, w, {
    inventory: inv, plan: { ...base, mode: 'serial', knockOn: false }, references: { greedy: true }, onProgress,
  });
  const { result: de, greedy } = touched;
  if (!greedy?.objective) throw new Error(`greedy gave no plan for ${inst.label}: ${greedy?.note}`);
  const { result: deKnockOn } = await computePlan(inst.scenario, w, {
    inventory: inv, plan: { ...base, mode: 'serial', knockOn: true, maxKnockOnMoves: MAX_KNOCK_ON_MOVES },
  });
  const touchedOnly = await exactPlanWindow(inv, w, { ...exact, problem: { maxCandidates: MAX_CANDIDATES } });
  const withKnockOn = await exactPlanWindow(inv, w, { ...exact, problem: { maxCandidates: MAX_CANDIDATES, knockOn: { maxMoves: MAX_KNOCK_ON_MOVES } } });
  return {
    label: inst.label, sites: inv.network.sites.length, slices: inv.slices.length, affected: de.affected.length,
    peakUtilisation: inst.peakUtilisation, gate: inst.gate,
    de: searchAlone(de), deMs: de.elapsedMs, deFallback: Boolean(de.search?.usedFallback), deTrace,
    deKnockOn: searchAlone(deKnockOn), deKnockOnMs: deKnockOn.elapsedMs,
    greedy: greedy.objective, greedyMs: greedy.elapsedMs,
    exact: exactOutcome(touchedOnly), exactKnockOn: exactOutcome(withKnockOn),
  };
}

const star = (e: ExactOutcome) => (e.optimal ? '*' : '');
const cost = (x: number) => (Number.isInteger(x) ? String(x) : x.toFixed(2));

/** The per-instance line: sizes, tightness, unresolved, move cost and time of every solver (* = proven optimal). */
export function describeOutcome(o: ShapeOutcome): string {
  return [
    `${o.sites} sites, ${o.slices} slices, ${o.affected} affected, peak ${(100 * o.peakUtilisation).toFixed(0)} %, knock-on gate ${o.gate ?? 'none'}`,
    `unresolved DE ${o.de.unresolved} / DE+k ${o.deKnockOn.unresolved} / greedy ${o.greedy.unresolved} / exact ${o.exact.objective.unresolved}${star(o.exact)} / exact+k ${o.exactKnockOn.objective.unresolved}${star(o.exactKnockOn)}`,
    `move cost DE ${cost(o.de.moveCost)} / DE+k ${cost(o.deKnockOn.moveCost)} / greedy ${cost(o.greedy.moveCost)} / exact ${cost(o.exact.objective.moveCost)} / exact+k ${cost(o.exactKnockOn.objective.moveCost)}`,
    `time DE ${ms(o.deMs)} / DE+k ${ms(o.deKnockOnMs)} / greedy ${ms(o.greedyMs)} / exact ${ms(o.exact.ms)} / exact+k ${ms(o.exactKnockOn.ms)}${o.deFallback ? '; DE alone lost to its greedy fallback' : ''}`,
  ].join('; ');
}
