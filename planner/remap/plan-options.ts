// Options of planWindow, their defaults, and the hooks through which other modes plug in.
import type { Scenario } from '../../shared/scenario';
import type { Objective, PlanMode, Reservation, SlicePlacement } from '../model/types';
import type { ParallelRunner } from './parallel-runner';
import type { RemapProblem } from './remap-types';

/** The search's figures after a generation (DE) or a migration (islands); the plan run's own progress, with phases, is shared/plans PlanProgress. */
export interface SearchProgress {
  generation: number;
  evaluations: number;
  best: Objective;
  elapsedMs: number;
}

/** What an exact solver hands back: a plan in index form and its optimality figures. */
export interface ExactOutcome {
  next: Map<number, SlicePlacement | null>;
  exact: { optimal: boolean; gap: number; bound: number };
}

/** 'exact' mode's solver (exactSolverFor in planner/exact), passed in so the DE modes never load HiGHS. */
export type ExactSolver = (problem: RemapProblem, options: { timeLimitMs: number }) => Promise<ExactOutcome>;

export interface PlanOptions {
  mode: PlanMode;
  seed: number;
  population: number;
  F: number;
  CR: number;
  generations: number;
  stallGenerations: number;
  timeLimitMs: number;
  workers: number;
  /** islands: generations between migrations */
  migrationInterval: number;
  maxCandidates: number;
  /** knock-on moves: the search may move or reroute slices the window does not touch to keep touched ones in service */
  knockOn: boolean;
  /** at most this many knock-on moves per plan */
  maxKnockOnMoves: number;
  /**
   * decodes per local search around DE (the seed's, the final one, half that per kick); default: a few passes
   * over the genome. A caller that wants a run bounded by counts rather than the clock sets it with `generations`.
   */
  polishEvaluations?: number;
  reservations?: Reservation;
  pinned?: string[];
  excludedSites?: string[];
  onProgress?: (p: SearchProgress) => void;
  /** the clock, passed in so tests can fix time */
  now?: () => number;
  /** the worker-thread runner the 'islands' and 'shared-eval' modes search on; the caller owns and closes it */
  parallel?: ParallelRunner;
  /** 'islands' and 'shared-eval': the scenario the inventory was built from, for the worker threads */
  scenario?: Scenario;
  /** the solver 'exact' mode runs */
  exact?: ExactSolver;
}

/**
 * WARNING: CR is low on purpose. The genome has one gene per function of every affected slice, and good
 * plans differ from the stay-put and greedy seeds in a few genes; a high CR rewrites most genes at once and
 * almost every trial then loses to its parent.
 */
export const PLAN_DEFAULTS: Omit<PlanOptions, 'reservations' | 'pinned' | 'excludedSites' | 'onProgress' | 'now' | 'parallel' | 'scenario' | 'exact'> = {
  mode: 'serial',
  seed: 1,
  population: 40,
  F: 0.5,
  CR: 0.1,
  generations: 300,
  stallGenerations: 30,
  timeLimitMs: 30_000,
  workers: 2,
  migrationInterval: 10,
  maxCandidates: 16,
  knockOn: true,
  maxKnockOnMoves: 5,
};
