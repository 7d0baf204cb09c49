// Iterated local search after DE: the best plan is kicked (a few slices' genes re-drawn, decode order
// included), local-searched again, and kept when better; it stops after KICKS_WITHOUT_GAIN kicks in a row bring
// nothing, or when the caller's time is up. DE tends to stall on scarce windows once every member sits in the
// same basin; a kick moves the search to a neighbouring one at the cost of one local search.
// Reference: H. R. Lourenço, O. C. Martin, T. Stützle, "Iterated local search", in Handbook of Metaheuristics
// (Kluwer, 2003) 321–353 (memory).
import { compareFitness } from '../de/fitness';
import type { Rng } from '../random/rng';
import type { Decoder } from './decoder';
import { localSearch, type Polished } from './local-search';
import type { RemapProblem } from './remap-types';
import { perturbedSeeds } from './seeding';

/** Kicks in a row without a better plan before the search stops. */
const KICKS_WITHOUT_GAIN = 8;
/** Slices re-drawn by one kick: 1 … KICK_SLICES. */
const KICK_SLICES = 4;

export function iterateLocalSearch(
  problem: RemapProblem, decoder: Decoder, start: Float64Array, maxEvaluations: number, rng: Rng, timeUp: () => boolean,
): Polished {
  let best: Polished = { genes: Float64Array.from(start), fitness: decoder.evaluate(start), evaluations: 1 };
  let idle = 0;
  let evaluations = 1;
  while (idle < KICKS_WITHOUT_GAIN && !timeUp() && problem.slices.length > 0) {
    const [kicked] = perturbedSeeds(problem, [best.genes], 1, rng, KICK_SLICES);
    const p = localSearch(problem, decoder, kicked, maxEvaluations, timeUp);
    evaluations += p.evaluations;
    if (compareFitness(p.fitness, best.fitness) < 0) {
      best = p;
      idle = 0;
    } else idle += 1;
  }
  return { ...best, evaluations };
}
