// Shared evaluation: one DE population on the calling thread; each generation's trial vectors are split
// into contiguous chunks and evaluated across the worker threads. The random stream and the operators are
// those of the serial loop, so for a given seed the search follows exactly the serial run.
import {
  bestIndex, checkDEOptions, compareFitness, initPopulation, makeTrials, selectTrials, type DEProblem, type Fitness,
} from '../de/differential-evolution';
import { createRng } from '../random/rng';
import type { ParallelRunInput, ParallelRunResult } from '../remap/parallel-runner';
import type { RemapWorker } from './worker-pool';
import type { ProblemShape } from './worker-protocol';

async function evaluateAcross(workers: RemapWorker[], genes: Float64Array[]): Promise<Fitness[]> {
  const per = Math.ceil(genes.length / workers.length);
  const parts = await Promise.all(workers.map((w, k) => {
    const chunk = genes.slice(k * per, (k + 1) * per);
    return chunk.length === 0 ? Promise.resolve([]) : w.request<Fitness[]>({ kind: 'evaluate', genes: chunk });
  }));
  return parts.flat();
}

export async function runSharedEval(input: ParallelRunInput, workers: RemapWorker[], shape: ProblemShape): Promise<ParallelRunResult> {
  const o = input.deOptions;
  checkDEOptions(o);
  const startMs = Date.now();
  const rng = createRng(input.seed);
  // Evaluation happens in the workers; this stand-in only lets initPopulation draw the members.
  const unevaluated: Fitness = { objective: [], violation: Infinity };
  const local: DEProblem = { ...shape, evaluate: () => unevaluated };
  const pop = initPopulation(local, o.population, rng, input.seeds);
  pop.fit = await evaluateAcross(workers, pop.x);
  let evaluations = pop.x.length;
  let bestFit = pop.fit[bestIndex(pop)];
  const trace = [{ generation: 0, evaluations, best: bestFit }];
  input.onGeneration?.({ generation: 0, evaluations, best: bestFit, bestGenes: pop.x[bestIndex(pop)] });
  let trials: Float64Array[] = [];
  let generation = 0;
  let stall = 0;
  while (generation < o.generations) {
    if (o.timeLimitMs !== undefined && Date.now() - startMs >= o.timeLimitMs) break;
    if (o.stallGenerations !== undefined && stall >= o.stallGenerations) break;
    generation += 1;
    trials = makeTrials(pop, local, rng, o, trials);
    const fit = await evaluateAcross(workers, trials);
    evaluations += trials.length;
    selectTrials(pop, trials, fit);
    const b = bestIndex(pop);
    stall = compareFitness(pop.fit[b], bestFit) < 0 ? 0 : stall + 1;
    bestFit = pop.fit[b];
    trace.push({ generation, evaluations, best: bestFit });
    input.onGeneration?.({ generation, evaluations, best: bestFit, bestGenes: pop.x[b] });
  }
  const b = bestIndex(pop);
  return { best: Float64Array.from(pop.x[b]), fitness: pop.fit[b], generations: generation, evaluations, trace };
}
