// The reference solvers shown beside a plan run: greedy always (fast), exact (HiGHS) only on small windows.
import type { Inventory, PlanResult, WindowSpec } from '../../planner/model/types';
import { planWindow, type PlanOptions } from '../../planner/remap/plan-window';
import type { ReferenceResult } from '../../shared/plans';

/**
 * The exact reference runs only when the window's re-mapping problem is small: at most this many decisions
 * (affected functions + affected ties). The planner benchmark's "small" tier (12 sites, ≤ 15 affected slices
 * of 2–4 functions) sits around this size and HiGHS proves the optimum there within seconds; a few dozen more
 * decisions and the integer program (candidate sites × candidate paths per tie) can run for minutes without
 * closing the gap, which would only delay the review.
 */
export const EXACT_MAX_DECISIONS = 60;
/** HiGHS's time budget: the reference must not hold the review back for long. */
export const EXACT_TIME_LIMIT_MS = 10_000;

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
  const startMs = Date.now();
  try {
    const r = await planWindow(inv, window, { ...options, mode: 'greedy' });
    return { solver: 'greedy', objective: r.objective, elapsedMs: Date.now() - startMs, ...noFigures, note: null };
  } catch (err) {
    return { solver: 'greedy', objective: null, elapsedMs: Date.now() - startMs, ...noFigures, note: `Greedy found no plan: ${message(err)}` };
  }
}

export async function exactReference(
  inv: Inventory, window: WindowSpec, result: PlanResult, options: Partial<PlanOptions>,
): Promise<ReferenceResult> {
  const decisions = decisionCount(inv, result);
  if (decisions > EXACT_MAX_DECISIONS) {
    return {
      solver: 'exact', objective: null, elapsedMs: 0, ...noFigures,
      note: `Skipped: ${decisions} affected functions and ties; the exact solver runs on windows with at most ${EXACT_MAX_DECISIONS}, where it finishes within ${EXACT_TIME_LIMIT_MS / 1000} s.`,
    };
  }
  const startMs = Date.now();
  try {
    const r = await planWindow(inv, window, { ...options, mode: 'exact', timeLimitMs: EXACT_TIME_LIMIT_MS });
    const exact = r.exact;
    const note = exact && !exact.optimal ? `Stopped at the ${EXACT_TIME_LIMIT_MS / 1000} s limit before proving the optimum.` : null;
    return {
      solver: 'exact', objective: r.objective, elapsedMs: Date.now() - startMs,
      optimal: exact?.optimal ?? null, gap: exact?.gap ?? null, bound: exact?.bound ?? null, note,
    };
  } catch (err) {
    return { solver: 'exact', objective: null, elapsedMs: Date.now() - startMs, ...noFigures, note: `The exact solver gave no answer: ${message(err)}` };
  }
}
