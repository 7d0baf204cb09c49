// The contract between planWindow and the multi-threaded DE modes ('islands', 'shared-eval').
// Everything in ParallelRunInput except the callback is structured-cloneable, so a worker thread can
// rebuild the same RemapProblem with buildInventory(scenario) + buildRemapProblem(inv, window, problemOptions).
import type { Scenario } from '../../shared/scenario';
import type { Fitness, DETracePoint, BoundRepair } from '../de/differential-evolution';
import type { WindowSpec } from '../model/types';
import type { RemapProblemOptions } from './remap-types';

export type ParallelMode = 'islands' | 'shared-eval';

/** DE settings that cross the thread boundary (no functions). */
export interface ParallelDEOptions {
  /** total population (islands split it between themselves) */
  population: number;
  F: number;
  CR: number;
  generations: number;
  stallGenerations?: number;
  timeLimitMs?: number;
  repair?: BoundRepair;
  /** islands: generations between ring migrations of each island's best member */
  migrationInterval?: number;
  /** islands: decodes each island's local search may spend on its best member after every epoch (memetic islands) */
  polishEvaluations?: number;
}

export interface ParallelProgress {
  generation: number;
  evaluations: number;
  best: Fitness;
  /** genes of the current best, so the caller can decode it on its own thread */
  bestGenes: Float64Array;
}

export interface ParallelRunInput {
  mode: ParallelMode;
  /** the validated scenario the caller's inventory was built from */
  scenario: Scenario;
  window: WindowSpec;
  problemOptions: RemapProblemOptions;
  deOptions: ParallelDEOptions;
  /** initial members (stay-put, greedy), in genome layout of the rebuilt problem */
  seeds: Float64Array[];
  /** master seed; per-island/per-worker streams come from deriveSeed(seed, k) */
  seed: number;
  /** worker threads to use */
  workers: number;
  /** stays on the calling thread */
  onGeneration?: (p: ParallelProgress) => void;
}

export interface ParallelRunResult {
  best: Float64Array;
  fitness: Fitness;
  generations: number;
  evaluations: number;
  trace: DETracePoint[];
}

export interface ParallelRunner {
  run(input: ParallelRunInput): Promise<ParallelRunResult>;
  /** release worker threads, when the runner holds any */
  close?(): Promise<void>;
}
