// Weights that turn the lexicographic objective (unresolved weight ≫ move cost ≫ usage) into one linear sum.
// Scaled so each level's smallest step outweighs everything below it:
//   weighted = W_u · unresolvedWeight + moveCost / δ + usage / (U_max + 1),
// with δ the granularity of the move costs (every cost a whole multiple of δ), U_max = Σ bw × latency budget
// over the affected ties (so the usage term stays below 1, one δ-step of move cost), and
// W_u = M_max / δ + 1 (M_max = the largest possible move cost, so one unresolved-weight step outweighs it).
import type { Objective } from '../model/types';
import { REROUTE_COST } from '../plan/evaluate-plan';
import type { RemapProblem } from '../remap/remap-types';

export interface ExactWeights {
  unresolved: number;
  move: number;
  usage: number;
  /** move-cost granularity δ; costs that are no multiple of it are ordered only to within δ */
  moveStep: number;
}

const STEPS = [1, 0.5, 0.25, 0.125, 0.1, 0.05, 0.025, 0.01, 0.005, 0.001];

function isMultiple(x: number, step: number): boolean {
  const q = x / step;
  return Math.abs(q - Math.round(q)) < 1e-9 * Math.max(1, q);
}

export function exactWeights(problem: RemapProblem): ExactWeights {
  const costs: number[] = [REROUTE_COST];
  let maxMove = 0;
  let maxUsage = 0;
  for (const block of problem.slices) {
    const slice = problem.inv.slices[block.slice];
    for (const f of slice.functions) {
      costs.push(f.moveCost);
      maxMove += f.moveCost;
    }
    for (const t of slice.ties) {
      maxMove += REROUTE_COST;
      maxUsage += t.bandwidthGbps * t.maxLatencyMs;
    }
  }
  const moveStep = STEPS.find((step) => costs.every((c) => isMultiple(c, step))) ?? STEPS[STEPS.length - 1];
  const move = 1 / moveStep;
  return { unresolved: maxMove * move + 1, move, usage: 1 / (maxUsage + 1), moveStep };
}

/** The single number the integer program minimises, for any plan's objective (e.g. DE's, to measure its gap). */
export function weightedObjective(w: ExactWeights, o: Pick<Objective, 'unresolvedWeight' | 'moveCost' | 'usage'>): number {
  return w.unresolved * o.unresolvedWeight + w.move * o.moveCost + w.usage * o.usage;
}
