// The reference solvers shown beside a plan run: greedy always (fast), exact (HiGHS) only on small windows.
import type { ReferenceResult } from '../../shared/plans';
import { exactSolverFor } from '../exact/exact-plan';
import type { PathSetting } from '../exact/exact-paths';
import type { Inventory, PlanResult, WindowSpec } from '../model/types';
import { planWindow, type PlanOptions } from '../remap/plan-window';

/**
 * The exact reference runs only on small windows: at most EXACT_MAX_SLICES affected slices and
 * EXACT_MAX_DECISIONS placement decisions (affected functions + affected ties). That is the planner benchmark's
 * "small" tier (bench/planner/quality-bench.ts: ≤ 15 affected slices, which came to 35–96 decisions there).
 * Measured with a 10 s limit on 2 shared cores: every affected demo window (up to 15 slices / 83 decisions)
 * finished in 0.03–15 s, most proven optimal; medium windows (116–368 decisions) mostly ended with no bound at
 * all after 14–20 s, so there the exact run would only hold the review back.
 */
export const EXACT_MAX_SLICES = 15;
export const EXACT_MAX_DECISIONS = 100;
/** HiGHS's time budget: the reference must not hold the review back for long. */
export const EXACT_TIME_LIMIT_MS = 10_000;
/**
 * Candidate paths per tie in the integer program: every simple path while a pair of sites has at most 20
 * (then the optimum is proven over every route), else the 4 shortest. The planner's default lists up to 200,
 * which on a 14-site window built a 15 MB program that took 31 s before HiGHS even started on the time limit.
 */
export const EXACT_PATHS: PathSetting = { kPaths: 4, maxAllPaths: 20, allPathsMaxSites: 30 };

const noFigures = { optimal: null, gap: null, bound: null } as const;

function message(err: unknown): string {
  return err instanceof Error ? err.message : String(err);
}

/** Affected functions + affected ties of the run: the number of placement decisions the exact program makes. */
export function decisionCount(inv: Inventory, result: PlanResult): number {
  return result.affected.reduce((n, id) => {
    const slice = inv.slices[inv.sliceIndex.get(id)!];
    return n + slice.functions.length + slice.ties.length;
  }, 0);
}

export async function greedyReference(inv: Inventory, window: WindowSpec, options: Partial<PlanOptions>): Promise<ReferenceResult> {
  const now = options.now ?? Date.now;
  const startMs = now();
  try {
    const r = await planWindow(inv, window, { ...options, mode: 'greedy' });
    return { solver: 'greedy', objective: r.objective, elapsedMs: now() - startMs, ...noFigures, note: null };
  } catch (err) {
    return { solver: 'greedy', objective: null, elapsedMs: now() - startMs, ...noFigures, note: `Greedy found no plan: ${message(err)}` };
  }
}

/** Why the exact reference does not run for this window, or null when it does. */
function skipped(inv: Inventory, result: PlanResult): ReferenceResult | null {
  if (result.affected.length === 0) {
    return { solver: 'exact', objective: null, elapsedMs: 0, ...noFigures, note: 'Not needed: the window affects no slice.' };
  }
  const decisions = decisionCount(inv, result);
  if (result.affected.length <= EXACT_MAX_SLICES && decisions <= EXACT_MAX_DECISIONS) return null;
  return {
    solver: 'exact', objective: null, elapsedMs: 0, ...noFigures,
    note: `Skipped: this window affects ${result.affected.length} slices (${decisions} functions and ties); the exact `
      + `solver runs only up to ${EXACT_MAX_SLICES} slices and ${EXACT_MAX_DECISIONS} functions and ties, where it usually `
      + `finishes within ${EXACT_TIME_LIMIT_MS / 1000} s.`,
  };
}

/**
 * The optimum and bound are those of the integer program; when some pair of sites had more routes than the
 * program lists, the note says the proof covers the listed routes only.
 */
export async function exactReference(
  inv: Inventory, window: WindowSpec, result: PlanResult, options: Partial<PlanOptions>,
): Promise<ReferenceResult> {
  const skip = skipped(inv, result);
  if (skip) return skip;
  const now = options.now ?? Date.now;
  const startMs = now();
  const seen = { complete: false };
  // The hook records whether every route was in the program, which planWindow's result does not carry.
  const exact = exactSolverFor(EXACT_PATHS, (r) => { seen.complete = r.complete; });
  try {
    const r = await planWindow(inv, window, { ...options, mode: 'exact', timeLimitMs: EXACT_TIME_LIMIT_MS, exact });
    const figures = r.exact;
    const notes = [
      figures && !figures.optimal ? `Stopped at the ${EXACT_TIME_LIMIT_MS / 1000} s limit before proving the optimum.` : '',
      seen.complete ? '' : `The program lists the ${EXACT_PATHS.kPaths} shortest routes per tie (and its current one), so its optimum covers those routes, not every route.`,
    ].filter(Boolean);
    return {
      solver: 'exact', objective: r.objective, elapsedMs: now() - startMs,
      optimal: figures?.optimal ?? null, gap: figures?.gap ?? null, bound: figures?.bound ?? null,
      note: notes.length > 0 ? notes.join(' ') : null,
    };
  } catch (err) {
    return { solver: 'exact', objective: null, elapsedMs: now() - startMs, ...noFigures, note: `The exact solver gave no answer: ${message(err)}` };
  }
}
