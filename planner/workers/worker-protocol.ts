// Messages between the parallel runner (main thread) and its remap workers; all structured-cloneable.
import type { Scenario } from '../../shared/scenario';
import type { Fitness, BoundRepair } from '../de/differential-evolution';
import type { WindowSpec } from '../model/types';
import type { RemapProblemOptions } from '../remap/remap-types';

export type WorkerRequest =
  | { kind: 'load'; scenario: Scenario; window: WindowSpec; problemOptions: RemapProblemOptions }
  | { kind: 'evaluate'; genes: Float64Array[] }
  | { kind: 'island-init'; size: number; seeds: Float64Array[]; rngSeed: number }
  | {
    kind: 'island-run'; generations: number; F: number; CR: number; repair?: BoundRepair; immigrant?: Member; deadlineMs?: number;
    /** decodes the island's local search may spend on its best member after the generations (0 = none) */
    polishEvaluations?: number;
  };

export interface Member {
  genes: Float64Array;
  fitness: Fitness;
}

export interface ProblemShape {
  dimension: number;
  lower: Float64Array;
  upper: Float64Array;
}

export interface IslandReport {
  best: Member;
  /** best fitness after each generation run in this call */
  perGeneration: Fitness[];
  evaluations: number;
}

export type WorkerReply =
  | { id: number; ok: true; value: unknown }
  | { id: number; ok: false; message: string };
