// One island of the island model: a sub-population evolved with the shared DE steps, kept inside a worker.
// Reference: R. Storn, K. Price, J. Global Optimization 11 (1997) 341–359 (DE/rand/1/bin steps);
// island model with ring migration of the best member, as in coarse-grained parallel evolutionary algorithms;
// optionally memetic: after each epoch the island's best member goes through a local search.
import {
  bestIndex, compareFitness, initPopulation, makeTrials, selectTrials, type BoundRepair, type DEProblem, type Fitness, type Population,
} from '../de/differential-evolution';
import { createRng, type Rng } from '../random/rng';
import type { IslandReport, Member } from './worker-protocol';

/** A local search the island applies to its best member (memetic islands); returns the improved member. */
export type Polish = (genes: Float64Array, maxEvaluations: number, deadlineMs?: number) => Member;

export class Island {
  private readonly rng: Rng;
  private readonly pop: Population;
  private trials: Float64Array[] = [];

  constructor(private readonly problem: DEProblem, size: number, seeds: Float64Array[], rngSeed: number, private readonly polish?: Polish) {
    this.rng = createRng(rngSeed);
    this.pop = initPopulation(problem, size, this.rng, seeds);
  }

  best(): Member {
    const b = bestIndex(this.pop);
    return { genes: Float64Array.from(this.pop.x[b]), fitness: this.pop.fit[b] };
  }

  /** The immigrant takes the place of the worst member (the first of equals, for determinism). */
  private receive(m: Member): void {
    let worst = 0;
    for (let i = 1; i < this.pop.fit.length; i += 1) if (compareFitness(this.pop.fit[i], this.pop.fit[worst]) > 0) worst = i;
    this.pop.x[worst] = Float64Array.from(m.genes);
    this.pop.fit[worst] = m.fitness;
  }

  /** The best member through the local search; it replaces that member when strictly better. */
  private polishBest(maxEvaluations: number, deadlineMs?: number): Fitness | null {
    if (!this.polish || maxEvaluations <= 0) return null;
    const b = bestIndex(this.pop);
    const m = this.polish(this.pop.x[b], maxEvaluations, deadlineMs);
    if (compareFitness(m.fitness, this.pop.fit[b]) >= 0) return null;
    this.pop.x[b] = Float64Array.from(m.genes);
    this.pop.fit[b] = m.fitness;
    return m.fitness;
  }

  run(generations: number, o: { F: number; CR: number; repair?: BoundRepair; immigrant?: Member; deadlineMs?: number; polishEvaluations?: number }): IslandReport {
    if (o.immigrant) this.receive(o.immigrant);
    const perGeneration: Fitness[] = [];
    let evaluations = 0;
    for (let g = 0; g < generations; g += 1) {
      if (o.deadlineMs !== undefined && Date.now() >= o.deadlineMs) break;
      this.trials = makeTrials(this.pop, this.problem, this.rng, o, this.trials);
      const fit = this.trials.map((t) => this.problem.evaluate(t));
      evaluations += fit.length;
      selectTrials(this.pop, this.trials, fit);
      perGeneration.push(this.pop.fit[bestIndex(this.pop)]);
    }
    const polished = perGeneration.length > 0 ? this.polishBest(o.polishEvaluations ?? 0, o.deadlineMs) : null;
    if (polished) perGeneration[perGeneration.length - 1] = polished;
    return { best: this.best(), perGeneration, evaluations };
  }
}
