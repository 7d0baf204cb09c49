// Exact reference for a window's re-mapping: the integer program of exact-model solved by HiGHS.
// Reference: Q. Huangfu, J. A. J. Hall, "Parallelizing the dual revised simplex method", Math. Prog. Comp. 10
// (2018) — HiGHS, used through its WebAssembly build (npm `highs`); the solver proves optimality or a bound.
import highs from 'highs';
import type { Inventory, Objective, SlicePlacement, WindowSpec } from '../model/types';
import { greedyPlan } from '../greedy/greedy-plan';
import { evaluatePlan } from '../plan/evaluate-plan';
import { buildRemapProblem } from '../remap/problem';
import type { ExactSolver } from '../remap/plan-options';
import type { RemapProblem, RemapProblemOptions } from '../remap/remap-types';
import { buildExactModel, type ExactModel } from './exact-model';
import type { PathSetting } from './exact-paths';
import { weightedObjective, type ExactWeights } from './exact-weights';

export interface ExactOptions extends Partial<PathSetting> {
  timeLimitMs?: number;
  now?: () => number;
  /** a known plan handed to the solver as its first incumbent (default: the greedy plan) */
  start?: Map<number, SlicePlacement | null>;
}

export const EXACT_DEFAULTS = { timeLimitMs: 30_000, kPaths: 4, maxAllPaths: 200, allPathsMaxSites: 30 };

export interface ExactResult {
  next: Map<number, SlicePlacement | null>;
  objective: Objective;
  /** the optimum of the program is proven (HiGHS status Optimal) */
  optimal: boolean;
  /** the program listed every simple path, so `optimal` means optimal for the whole candidate-site problem */
  complete: boolean;
  /** relative gap (incumbent − bound) / incumbent in the weighted objective */
  gap: number;
  /** best proven lower bound of the weighted objective (≥ 0) */
  bound: number;
  /** the incumbent's weighted objective */
  weighted: number;
  weights: ExactWeights;
  status: string;
  columns: number;
  elapsedMs: number;
}

type Solver = Awaited<ReturnType<typeof highs>>;
let solverPromise: Promise<Solver> | undefined;

/** One WebAssembly instance per thread; each solve still gets a fresh native model. */
function solver(): Promise<Solver> {
  solverPromise ??= highs();
  return solverPromise;
}

interface Solved {
  status: string;
  values: Map<string, number> | null;
  bound: number;
}

/** Names of the variables set to 1 by `start`, or null when the start is not representable in the model. */
function startOnes(p: RemapProblem, model: ExactModel, start: Map<number, SlicePlacement | null>): Set<string> | null {
  const ones = new Set<string>();
  const key = (block: number, tie: number, a: number, b: number, spans: readonly number[]) => `${block}|${tie}|${a}|${b}|${spans.join()}`;
  const byKey = new Map(model.tieVars.map((y) => [key(y.block, y.tie, y.a, y.b, y.option.spans), y.name]));
  for (let i = 0; i < p.slices.length; i += 1) {
    const block = p.slices[i];
    const placement = start.get(block.slice);
    if (!placement || (block.touched && block.blockedReason !== undefined)) {
      if (!block.touched) return null;
      ones.add(`u${i}`);
      continue;
    }
    const current = p.inv.placements[block.slice];
    const moved = placement.sites.some((s, f) => s !== current.sites[f])
      || placement.paths.some((path, t) => path.join() !== current.paths[t].join());
    if (!block.touched && moved) ones.add(`m${i}`);
    for (const k of block.functions) {
      const c = p.functions[k].candidates.indexOf(placement.sites[p.functions[k].fn]);
      if (c < 0) return null;
      ones.add(`x${k}_${c}`);
    }
    for (let tie = 0; tie < placement.paths.length; tie += 1) {
      const t = p.inv.slices[block.slice].ties[tie];
      const name = byKey.get(key(i, tie, placement.sites[t.from], placement.sites[t.to], placement.paths[tie]));
      if (name === undefined) return null;
      ones.add(name);
    }
  }
  return ones;
}

function solve(s: Solver, model: ExactModel, timeLimitMs: number, start: Set<string> | null): Solved {
  return s.withModel({ format: 'lp', data: model.lp }, (m) => {
    m.options.set({ output_flag: false, time_limit: Math.max(0.001, timeLimitMs / 1000), mip_rel_gap: 0 });
    if (start) {
      const colValue = Array.from({ length: m.getDimensions().numCols }, (_, i) => (start.has(m.getColName(i)) ? 1 : 0));
      // HiGHS checks the start itself and ignores it when infeasible.
      m.setSolution({ colValue });
    }
    const run = m.run();
    const names = Object.entries(s.constants.modelStatus).find(([, code]) => code === run.modelStatus)?.[0] ?? 'unknown';
    const hasPrimal = Number(m.info.get('primal_solution_status')) >= 2;
    let values: Map<string, number> | null = null;
    if (hasPrimal) {
      const x = m.getSolution().colValue;
      values = new Map();
      for (let i = 0; i < x.length; i += 1) values.set(m.getColName(i), x[i]);
    }
    return { status: names, values, bound: Number(m.info.get('mip_dual_bound')) };
  });
}

function extract(p: RemapProblem, model: ExactModel, values: Map<string, number> | null): Map<number, SlicePlacement | null> {
  const next = new Map<number, SlicePlacement | null>();
  const on = (name: string) => (values?.get(name) ?? 0) > 0.5;
  const paths = new Map<number, number[][]>();
  for (const v of model.tieVars) {
    if (!on(v.name)) continue;
    const list = paths.get(v.block) ?? [];
    list[v.tie] = v.option.spans;
    paths.set(v.block, list);
  }
  p.slices.forEach((block, i) => {
    if (values === null && !block.touched) {
      next.set(block.slice, p.inv.placements[block.slice]);
      return;
    }
    if (values === null || block.blockedReason !== undefined || on(`u${i}`)) {
      next.set(block.slice, null);
      return;
    }
    const sites = block.functions.map((k) => {
      const f = p.functions[k];
      const c = Array.from(f.candidates.keys()).find((cand) => on(`x${k}_${cand}`)) ?? 0;
      return f.candidates[c];
    });
    const tieCount = p.inv.slices[block.slice].ties.length;
    next.set(block.slice, { sites, paths: Array.from({ length: tieCount }, (_t, k) => paths.get(i)?.[k] ?? []) });
  });
  return next;
}

/**
 * Time per column of the program kept back from HiGHS's limit: reading the program's text into HiGHS, handing
 * it the start and reading the answer back happen outside HiGHS's own clock, and on a 250,000-column program
 * (a 50-site window touching 70 slices) they took about 13 s on a shared core — a 20 s limit ran 33 s.
 */
const IO_MS_PER_COLUMN = 0.05;

/** Solves the re-mapping problem exactly (within the time limit, building and reading the program included). */
export async function exactPlan(problem: RemapProblem, options: ExactOptions = {}): Promise<ExactResult> {
  const o = { ...EXACT_DEFAULTS, ...options };
  const now = o.now ?? Date.now;
  const startMs = now();
  const s = await solver();
  const start = o.start ?? greedyPlan(problem).next;
  const model = buildExactModel(problem, { kPaths: o.kPaths, maxAllPaths: o.maxAllPaths, allPathsMaxSites: o.allPathsMaxSites }, start);
  const solved = problem.slices.length === 0
    ? { status: 'optimal', values: new Map<string, number>(), bound: 0 }
    : solve(s, model, Math.max(1, o.timeLimitMs - (now() - startMs) - model.columns * IO_MS_PER_COLUMN), startOnes(problem, model, start));
  const next = extract(problem, model, solved.values);
  const objective = evaluatePlan(problem.inv, problem.window, next, problem.options.reservations);
  const weighted = weightedObjective(model.weights, objective);
  const optimal = solved.status === 'optimal';
  // Every coefficient is ≥ 0, so 0 bounds the optimum even when HiGHS stops before its root relaxation.
  const bound = optimal ? weighted : Math.min(weighted, Math.max(0, Number.isFinite(solved.bound) ? solved.bound : 0));
  return {
    next, objective, optimal, complete: model.complete,
    gap: optimal || weighted === 0 ? 0 : (weighted - bound) / weighted,
    bound, weighted, weights: model.weights, status: solved.status, columns: model.columns, elapsedMs: now() - startMs,
  };
}

/** Convenience for callers holding an inventory and window rather than a built problem. */
export async function exactPlanWindow(
  inv: Inventory, window: WindowSpec, options: ExactOptions & { problem?: RemapProblemOptions } = {},
): Promise<ExactResult & { problem: RemapProblem }> {
  const problem = buildRemapProblem(inv, window, options.problem);
  return { ...(await exactPlan(problem, options)), problem };
}

/**
 * planWindow's 'exact' mode hook (`options.exact`) with a path setting; `onResult` sees the solver's full result
 * (e.g. whether every route was in the program), which the hook's answer to planWindow leaves out.
 */
export function exactSolverFor(paths: Partial<PathSetting> = {}, onResult?: (r: ExactResult) => void): ExactSolver {
  return async (problem, options) => {
    const r = await exactPlan(problem, { ...paths, timeLimitMs: options.timeLimitMs });
    onResult?.(r);
    return { next: r.next, exact: { optimal: r.optimal, gap: r.gap, bound: r.bound } };
  };
}

/** planWindow's 'exact' mode hook with the default path setting. */
export const exactSolver: ExactSolver = exactSolverFor();
