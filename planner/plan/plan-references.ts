// The reference solvers shown beside a plan run: greedy always (fast), exact (HiGHS) on windows up to a size it
// can prove within its own limit.
import type { ReferenceResult } from '../../shared/plans';
import { exactSolverFor } from '../exact/exact-plan';
import type { PathSetting } from '../exact/exact-paths';
import type { Inventory, PlanResult, WindowSpec } from '../model/types';
import { planWindow, type PlanOptions } from '../remap/plan-window';

/**
 * The exact reference runs on every window up to EXACT_MAX_SLICES touched slices and EXACT_MAX_DECISIONS placement
 * decisions (touched functions + touched ties), with its own time limit; above that it is not attempted and says
 * why. Windows with 20–50 touched slices solve to proven optimality in seconds to a couple of minutes; a run that
 * stops at the limit reports its best bound and gap. The first limits (15 slices, 100 decisions, 10 s) were set
 * when the program listed up to 200 routes per tie; EXACT_PATHS keeps it to a few since.
 */
export const EXACT_MAX_SLICES = 100;
export const EXACT_MAX_DECISIONS = 800;
/** HiGHS's own time budget, apart from the search's limit (the plan job gives it at most twice the search's, see computePlan). */
export const EXACT_TIME_LIMIT_MS = 60_000;
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

/**
 * The greedy reference a DE run already holds (PlanResult.greedy: the plan it started from, on the same problem),
 * so the references do not solve the window again after the search's time is up; null when the run has none.
 */
export function greedyFromSearch(result: PlanResult): ReferenceResult | null {
  if (!result.greedy) return null;
  return { solver: 'greedy', objective: result.greedy.objective, elapsedMs: result.greedy.elapsedMs, ...noFigures, note: null };
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
    note: `Not attempted: this window affects ${result.affected.length} slices (${decisions} functions and ties); the exact `
      + `solver runs up to ${EXACT_MAX_SLICES} slices and ${EXACT_MAX_DECISIONS} functions and ties, the size it can usually `
      + `prove optimal within its ${EXACT_TIME_LIMIT_MS / 1000} s limit.`,
  };
}

/** Why an exact run that stopped at its limit is not proven: its gap to the best bound, when it has one. */
function stoppedNote(gap: number, bound: number, limitMs: number): string {
  const limit = `Stopped at the ${Number((limitMs / 1000).toFixed(1))} s limit before proving the optimum`;
  if (!(bound > 0) || !Number.isFinite(gap)) return `${limit}; it proved no bound above zero.`;
  return `${limit}; its plan is within ${(100 * gap).toFixed(1)} % of the best proven bound.`;
}

/**
 * The optimum and bound are those of the integer program; when some pair of sites had more routes than the
 * program lists, the note says the proof covers the listed routes only.
 */
export async function exactReference(
  inv: Inventory, window: WindowSpec, result: PlanResult, options: Partial<PlanOptions>, limitMs = EXACT_TIME_LIMIT_MS,
): Promise<ReferenceResult> {
  const skip = skipped(inv, result);
  if (skip) return skip;
  const now = options.now ?? Date.now;
  const startMs = now();
  const seen = { complete: false };
  // The hook records whether every route was in the program, which planWindow's result does not carry.
  const exact = exactSolverFor(EXACT_PATHS, (r) => { seen.complete = r.complete; });
  try {
    const r = await planWindow(inv, window, { ...options, mode: 'exact', timeLimitMs: limitMs, exact });
    const figures = r.exact;
    const notes = [
      figures && !figures.optimal ? stoppedNote(figures.gap, figures.bound, limitMs) : '',
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
