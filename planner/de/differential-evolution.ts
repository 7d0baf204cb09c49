// Differential Evolution (DE/rand/1/bin) with feasibility-rule constraint handling: the serial loop.
// Reference: R. Storn, K. Price, J. Global Optimization 11 (1997) 341–359; K. Deb, CMAME 186 (2000) 311–338.
import { InvalidOptionError } from '../errors';
import type { Rng } from '../random/rng';
import { compareFitness, type Fitness } from './fitness';
import { bestIndex, initPopulation, makeTrials, selectTrials, UNEVALUATED, type BoundRepair, type DEProblem } from './population';

export { compareFitness, compareObjectiveVectors, isFeasible, type Fitness } from './fitness';
export {
  bestIndex,
  initPopulation,
  makeTrials,
  selectTrials,
  type BoundRepair,
  type DEProblem,
  type Population,
  type TrialOptions,
} from './population';

export interface DEOptions {
  population: number;
  F: number;
  CR: number;
  /** generations after the initial population */
  generations: number;
  /** stop after this many generations without a strictly better best member */
  stallGenerations?: number;
  /** stop once this much time has passed, measured with `now` */
  timeLimitMs?: number;
  now?: () => number;
  repair?: BoundRepair;
  onGeneration?: (generation: number, best: Fitness, evaluations: number) => void;
}

export interface DETracePoint {
  generation: number;
  evaluations: number;
  best: Fitness;
}

/** Why a run ended: its generation budget, its stall limit, or its time limit (this last depends on the machine's speed). */
export type DEStop = 'generations' | 'stall' | 'time';

export interface DEResult {
  best: Float64Array;
  fitness: Fitness;
  /** generations run after the initial population */
  generations: number;
  evaluations: number;
  /** best fitness after the initial population (generation 0) and after each generation */
  trace: DETracePoint[];
  stoppedBy: DEStop;
}

/** Throws InvalidOptionError unless F, CR and the counts are in the ranges DE defines. */
export function checkDEOptions(o: Pick<DEOptions, 'population' | 'F' | 'CR' | 'generations'>): void {
  if (!(o.F >= 0 && o.F <= 2)) throw new InvalidOptionError('F must be within [0, 2]');
  if (!(o.CR >= 0 && o.CR <= 1)) throw new InvalidOptionError('CR must be within [0, 1]');
  if (!Number.isInteger(o.population) || o.population < 4) throw new InvalidOptionError('population must be an integer ≥ 4');
  if (!Number.isInteger(o.generations) || o.generations < 0) throw new InvalidOptionError('generations must be an integer ≥ 0');
}

/** Minimises `problem` from `rng`; the seeds (e.g. known good solutions) join the initial population. */
export function runDE(problem: DEProblem, options: DEOptions, rng: Rng, seeds?: Float64Array[]): DEResult {
  checkDEOptions(options);
  const now = options.now ?? Date.now;
  const startMs = now();
  // Any check that finds the time up cuts something short (members, trials or generations): the run ended by time.
  let timeCut = false;
  const timeUp = () => {
    const up = options.timeLimitMs !== undefined && now() - startMs >= options.timeLimitMs;
    if (up) timeCut = true;
    return up;
  };
  const pop = initPopulation(problem, options.population, rng, seeds, timeUp);
  let evaluations = pop.fit.filter((f) => f !== UNEVALUATED).length;
  let best = bestIndex(pop);
  let bestFit = pop.fit[best];
  const trace: DETracePoint[] = [{ generation: 0, evaluations, best: bestFit }];
  options.onGeneration?.(0, bestFit, evaluations);
  let trials: Float64Array[] = [];
  let stall = 0;
  let generation = 0;
  let stalled = false;
  while (generation < options.generations) {
    if (timeUp()) break;
    if (options.stallGenerations !== undefined && stall >= options.stallGenerations) {
      stalled = true;
      break;
    }
    generation += 1;
    trials = makeTrials(pop, problem, rng, options, trials);
    // Time is checked between evaluations too: one generation of a large problem can take seconds. Trials left
    // unevaluated when time is up lose to their parents (the generation still completes deterministically
    // whenever time is not up).
    const trialFit: Fitness[] = [];
    for (let i = 0; i < trials.length; i += 1) {
      const t = trials[i];
      const late = trialFit.length > 0 && timeUp();
      const evaluate = () => (problem.evaluateTrial ? problem.evaluateTrial(t, pop.x[i]) : problem.evaluate(t));
      trialFit.push(late ? UNEVALUATED : evaluate());
      if (!late) evaluations += 1;
    }
    selectTrials(pop, trials, trialFit);
    best = bestIndex(pop);
    stall = compareFitness(pop.fit[best], bestFit) < 0 ? 0 : stall + 1;
    bestFit = pop.fit[best];
    trace.push({ generation, evaluations, best: bestFit });
    options.onGeneration?.(generation, bestFit, evaluations);
  }
  const stoppedBy: DEStop = timeCut ? 'time' : stalled ? 'stall' : 'generations';
  return { best: Float64Array.from(pop.x[best]), fitness: bestFit, generations: generation, evaluations, trace, stoppedBy };
}
