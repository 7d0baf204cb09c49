// One plan run's computation, without the database: the DE re-mapper (serial or islands), the greedy and — on
// small windows — the exact reference for the same window, and the review built from them. The plan worker runs it
// in a worker thread and stores what it returns; progress goes out through the callback.
import { InvalidOptionError } from '../../planner/errors';
import { buildInventory, compileWindow } from '../../planner/model/build-inventory';
import type { Inventory, PlanResult, Reservation, WindowSpec } from '../../planner/model/types';
import { planWindow, type PlanOptions } from '../../planner/remap/plan-window';
import { buildReview } from '../../planner/review/build-review';
import { createParallelRunner } from '../../planner/workers/parallel-runner';
import type { PlanProgress, PlanReview, PlanSettings, ReferenceResult } from '../../shared/plans';
import type { Scenario } from '../../shared/scenario';
import { exactReference, greedyReference } from './plan-compute-references';

export interface PlanComputeInput {
  /** the current inventory with the window among `windows` */
  scenario: Scenario;
  windowId: string;
  settings: PlanSettings;
  reservations: Reservation;
  reservedFor: string[];
}

export type PlanProgressListener = (p: PlanProgress) => void;

function findWindow(scenario: Scenario, windowId: string): WindowSpec {
  const w = (scenario.windows ?? []).find((x) => x.id === windowId);
  if (!w) throw new InvalidOptionError(`window "${windowId}" is not in the scenario handed to the plan run`);
  return compileWindow(w);
}

/** Options shared by the DE run and the references, so all three solve the same problem. */
function baseOptions(input: PlanComputeInput): Partial<PlanOptions> {
  const s = input.settings;
  return {
    seed: s.seed, population: s.population, timeLimitMs: s.timeLimitSeconds * 1000,
    pinned: [...s.pinned], excludedSites: [...s.excludedSites], reservations: input.reservations,
    knockOn: s.knockOn, maxKnockOnMoves: s.maxKnockOnMoves,
  };
}

async function runSearch(
  inv: Inventory, window: WindowSpec, input: PlanComputeInput, report: (p: Omit<PlanProgress, 'phase' | 'timeLimitMs'>) => void,
): Promise<PlanResult> {
  const parallel = input.settings.mode === 'islands' ? createParallelRunner() : undefined;
  try {
    return await planWindow(inv, window, {
      ...baseOptions(input), mode: input.settings.mode, scenario: input.scenario, parallel,
      onProgress: (p) => report({ generation: p.generation, evaluations: p.evaluations, best: p.best, elapsedMs: p.elapsedMs }),
    });
  } finally {
    await parallel?.close();
  }
}

export async function computePlan(input: PlanComputeInput, onProgress: PlanProgressListener): Promise<PlanReview> {
  const startMs = Date.now();
  const timeLimitMs = input.settings.timeLimitSeconds * 1000;
  let last: Omit<PlanProgress, 'phase' | 'timeLimitMs' | 'elapsedMs'> = { generation: 0, evaluations: 0, best: null };
  // Elapsed time is the whole run's, so it never goes backwards between phases.
  const emit = (phase: PlanProgress['phase']) => onProgress({ phase, ...last, elapsedMs: Date.now() - startMs, timeLimitMs });
  emit('preparing');
  const inv = buildInventory(input.scenario);
  const window = findWindow(input.scenario, input.windowId);
  const result = await runSearch(inv, window, input, (p) => {
    last = { generation: p.generation, evaluations: p.evaluations, best: p.best };
    emit('searching');
  });
  emit('references');
  const greedy: ReferenceResult = await greedyReference(inv, window, baseOptions(input));
  const exact: ReferenceResult = await exactReference(inv, window, result, baseOptions(input));
  emit('finishing');
  const names = new Map(input.scenario.slices.map((s) => [s.id, s.name]));
  return buildReview(inv, window, result, {
    reservations: input.reservations, reservedFor: input.reservedFor, names, greedy, exact, computeMs: result.elapsedMs,
  });
}
