// A plan run's computation for the plan job, without the database: the planner's computePlan with the run's
// settings, both references and the review. The job runs this in a worker thread of its own and stores what it
// returns; progress goes out through the callback. Islands runs get a worker-thread pool, closed when done.
import type { Reservation } from '../../planner/model/types';
import { computePlan as computePlanRun, scenarioWindowSpec } from '../../planner/plan/compute-plan';
import type { PlanOptions } from '../../planner/remap/plan-window';
import { withParallelRunner } from '../../planner/workers/parallel-runner';
import type { PlanProgress, PlanReview, PlanSettings } from '../../shared/plans';
import type { Scenario } from '../../shared/scenario';

export interface PlanComputeInput {
  /** the current inventory with the window among `windows` */
  scenario: Scenario;
  windowId: string;
  settings: PlanSettings;
  reservations: Reservation;
  reservedFor: string[];
}

export type PlanProgressListener = (p: PlanProgress) => void;

/** The planner options a run's settings stand for; the search and both references use them. */
function planOptionsOf(input: PlanComputeInput): Partial<PlanOptions> {
  const s = input.settings;
  return {
    mode: s.mode, seed: s.seed, population: s.population, timeLimitMs: s.timeLimitSeconds * 1000,
    pinned: [...s.pinned], excludedSites: [...s.excludedSites], reservations: input.reservations,
    knockOn: s.knockOn, maxKnockOnMoves: s.maxKnockOnMoves,
  };
}

export async function computePlan(input: PlanComputeInput, onProgress: PlanProgressListener): Promise<PlanReview> {
  const window = scenarioWindowSpec(input.scenario, input.windowId);
  const computed = await withParallelRunner((parallel) => computePlanRun(input.scenario, window, {
    plan: { ...planOptionsOf(input), parallel }, references: { greedy: true, exact: true },
    review: { reservedFor: input.reservedFor }, onProgress,
  }));
  return computed.review!;
}
