// One plan run for a window: the search (planWindow in the chosen mode), the greedy and exact references beside
// it when asked, and the review built from them. The plan job, the command line and the benchmark all run plans
// through here, so they solve the same problem the same way; threads, files and the clock stay with the caller
// (a parallel runner and `now` are passed in).
import type { PlanProgress, PlanReview, ReferenceResult } from '../../shared/plans';
import type { Scenario } from '../../shared/scenario';
import { InvalidOptionError, PlannerError } from '../errors';
import { exactSolver } from '../exact/exact-plan';
import { buildInventory, compileWindow } from '../model/build-inventory';
import type { Inventory, PlanResult, WindowSpec } from '../model/types';
import { PLAN_DEFAULTS, planWindow, type PlanOptions } from '../remap/plan-window';
import { buildReview } from '../review/build-review';
import { EXACT_TIME_LIMIT_MS, exactReference, greedyFromSearch, greedyReference } from './plan-references';

/** The run was cancelled between two of its phases. */
export class PlanCancelledError extends PlannerError {
  constructor() {
    super('PLAN_CANCELLED', 'the plan run was cancelled');
  }
}

export type PlanPhase = PlanProgress['phase'];

export interface ComputePlanOptions {
  /** the search's options; the references share them (seed, limits, reservations, pins …) but not the mode */
  plan?: Partial<Omit<PlanOptions, 'onProgress' | 'scenario' | 'exact'>>;
  /** the inventory built from the scenario, when the caller already has it */
  inventory?: Inventory;
  /** reference solvers: greedy when asked (from the search's own run in DE modes), exact up to EXACT_MAX_SLICES */
  references?: { greedy?: boolean; exact?: boolean };
  /** build the review (needs both references); `reservedFor` names the windows whose plans reserved capacity */
  review?: { reservedFor: string[] };
  /** phase and search figures; elapsed time is the whole run's, so it never goes backwards between phases */
  onProgress?: (p: PlanProgress) => void;
  /** checked between phases: once aborted, the run stops with PlanCancelledError */
  signal?: { readonly aborted: boolean };
}

export interface ComputedPlan {
  inventory: Inventory;
  window: WindowSpec;
  /** the search's result (in a DE mode, the better of its plan and greedy's; `result.search` is its own) */
  result: PlanResult;
  greedy: ReferenceResult | null;
  exact: ReferenceResult | null;
  review: PlanReview | null;
}

/** The WindowSpec of the scenario's window `windowId`. */
export function scenarioWindowSpec(scenario: Scenario, windowId: string): WindowSpec {
  const w = (scenario.windows ?? []).find((x) => x.id === windowId);
  if (!w) throw new InvalidOptionError(`unknown window "${windowId}": the scenario handed to the plan run has no such window`);
  return compileWindow(w);
}

export async function computePlan(scenario: Scenario, window: WindowSpec, options: ComputePlanOptions = {}): Promise<ComputedPlan> {
  const plan = options.plan ?? {};
  const now = plan.now ?? Date.now;
  const startMs = now();
  const timeLimitMs = plan.timeLimitMs ?? PLAN_DEFAULTS.timeLimitMs;
  let last: Pick<PlanProgress, 'generation' | 'evaluations' | 'best'> = { generation: 0, evaluations: 0, best: null };
  const enter = (phase: PlanPhase) => {
    if (options.signal?.aborted) throw new PlanCancelledError();
    options.onProgress?.({ phase, ...last, elapsedMs: now() - startMs, timeLimitMs });
  };
  enter('preparing');
  const inventory = options.inventory ?? buildInventory(scenario);
  const result = await planWindow(inventory, window, {
    ...plan, scenario, exact: exactSolver,
    onProgress: (p) => {
      last = { generation: p.generation, evaluations: p.evaluations, best: p.best };
      options.onProgress?.({ phase: 'searching', ...last, elapsedMs: now() - startMs, timeLimitMs });
    },
  });
  const wanted = options.references ?? {};
  if (wanted.greedy || wanted.exact) enter('references');
  // The references solve the search's problem (same options) with their own solver. A DE run brings greedy's
  // plan with it (it started from it), so its time limit covers the greedy reference; exact has its own limit.
  const { mode: _mode, parallel: _parallel, ...shared } = plan;
  const greedy = wanted.greedy ? greedyFromSearch(result) ?? await greedyReference(inventory, window, shared) : null;
  // Exact gets its own limit, but at most twice the search's: the plan job's queue expiry allows a run about three
  // times its limit (server/services/plans/expire.ts), and greedy no longer takes any of that.
  const exact = wanted.exact ? await exactReference(inventory, window, result, shared, Math.min(EXACT_TIME_LIMIT_MS, 2 * timeLimitMs)) : null;
  if (!options.review) return { inventory, window, result, greedy, exact, review: null };
  if (!greedy) throw new InvalidOptionError('the review needs the greedy reference (options.references.greedy)');
  enter('finishing');
  const review = buildReview(inventory, window, result, {
    reservations: plan.reservations, reservedFor: options.review.reservedFor,
    names: new Map(scenario.slices.map((s) => [s.id, s.name])), greedy, exact, computeMs: result.elapsedMs,
  });
  return { inventory, window, result, greedy, exact, review };
}
