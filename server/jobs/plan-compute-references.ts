// The reference solvers shown beside a plan run: greedy always (fast), exact (HiGHS) only on small windows.
import type { Inventory, PlanResult, WindowSpec } from '../../planner/model/types';
import { planWindow, type PlanOptions } from '../../planner/remap/plan-window';
import type { ReferenceResult } from '../../shared/plans';

/**
 * The exact reference runs only on small windows: at most EXACT_MAX_SLICES affected slices and
 * EXACT_MAX_DECISIONS placement decisions (affected functions + affected ties). That is the planner benchmark's
 * "small" tier (bench/planner/quality-bench.ts: ≤ 15 affected slices, which came to 35–96 decisions there).
 * Measured with a 10 s limit on 2 shared cores: every demo window (up to 15 slices / 83 decisions) was proven
 * optimal in 0.01–10 s; on the generated small tier about a third stopped at the limit without a proof (the
 * review then shows the bound and gap); medium windows (116–368 decisions) mostly ended with no bound at all
 * after 14–20 s, so there the exact run would only hold the review back.
 */
export const EXACT_MAX_SLICES = 15;
export const EXACT_MAX_DECISIONS = 100;
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
  if (result.affected.length > EXACT_MAX_SLICES || decisions > EXACT_MAX_DECISIONS) {
    return {
      solver: 'exact', objective: null, elapsedMs: 0, ...noFigures,
      note: `Skipped: this window affects ${result.affected.length} slices (${decisions} functions and ties); the exact `
        + `solver runs only up to ${EXACT_MAX_SLICES} slices and ${EXACT_MAX_DECISIONS} functions and ties, where it usually `
        + `finishes within ${EXACT_TIME_LIMIT_MS / 1000} s.`,
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
