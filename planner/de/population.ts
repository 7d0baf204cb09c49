// One generation of DE/rand/1/bin split into steps (initialise, make trials, select) so that the
// serial loop, the island model and shared evaluation all share the same operators.
// Reference: R. Storn, K. Price, "Differential Evolution", J. Global Optimization 11 (1997) 341–359.
import { InvalidOptionError } from '../errors';
import { randomInt, type Rng } from '../random/rng';
import { compareFitness, type Fitness } from './fitness';

export interface DEProblem {
  dimension: number;
  lower: Float64Array;
  upper: Float64Array;
  evaluate(x: Float64Array): Fitness;
  /** evaluate a trial made from `parent` (a population member); when given, must equal evaluate(trial) */
  evaluateTrial?(trial: Float64Array, parent: Float64Array): Fitness;
}

export interface Population {
  x: Float64Array[];
  fit: Fitness[];
}

/** How a mutant coordinate outside its bounds is brought back (both keep the parent's side). */
export type BoundRepair = 'resample' | 'reflect';

export interface TrialOptions {
  /** differential weight, Storn & Price: F ∈ [0, 2] */
  F: number;
  /** crossover rate, CR ∈ [0, 1] */
  CR: number;
  repair?: BoundRepair;
}

/** Genes in which `a` and `b` differ. */
function differing(a: Float64Array, b: Float64Array): number {
  let n = 0;
  for (let j = 0; j < a.length; j += 1) if (a[j] !== b[j]) n += 1;
  return n;
}

/** Fitness of a member that was not evaluated (time ran out): it loses to every evaluated candidate. */
export const UNEVALUATED: Fitness = { objective: [], violation: Infinity };

/**
 * Population members: the seeds first (clipped to the bounds), then uniform random points. With
 * `problem.evaluateTrial`, a member after the first is evaluated as a trial of the nearer of the first two
 * (seeds are mostly near-copies of those). Once `timeUp` says so, the rest are left UNEVALUATED.
 */
export function initPopulation(problem: DEProblem, size: number, rng: Rng, seeds: Float64Array[] = [], timeUp?: () => boolean): Population {
  if (!Number.isInteger(size) || size < 4) throw new InvalidOptionError('population must be an integer ≥ 4');
  const { dimension, lower, upper } = problem;
  const x: Float64Array[] = [];
  for (let i = 0; i < size; i += 1) {
    const v = new Float64Array(dimension);
    const seed = i < seeds.length ? seeds[i] : undefined;
    for (let j = 0; j < dimension; j += 1) {
      v[j] = seed ? Math.min(upper[j], Math.max(lower[j], seed[j])) : lower[j] + rng() * (upper[j] - lower[j]);
    }
    x.push(v);
  }
  const fit: Fitness[] = [];
  for (let i = 0; i < size; i += 1) {
    if (i > 0 && timeUp?.()) fit.push(UNEVALUATED);
    else if (i === 0 || !problem.evaluateTrial) fit.push(problem.evaluate(x[i]));
    else {
      const parent = i > 1 && differing(x[i], x[1]) < differing(x[i], x[0]) ? x[1] : x[0];
      fit.push(problem.evaluateTrial(x[i], parent));
    }
  }
  return { x, fit };
}

function repairGene(v: number, parent: number, lo: number, hi: number, rng: Rng, repair: BoundRepair): number {
  if (v >= lo && v <= hi) return v;
  if (repair === 'reflect') {
    const r = v < lo ? 2 * lo - v : 2 * hi - v;
    if (r >= lo && r <= hi) return r;
  }
  // Between the parent and the violated bound: keeps the search on the side it came from.
  return v < lo ? lo + rng() * (parent - lo) : hi - rng() * (hi - parent);
}

/** Three distinct member indices, all different from `i`. */
function pickThree(n: number, i: number, rng: Rng): [number, number, number] {
  let r1 = randomInt(rng, n);
  while (r1 === i) r1 = randomInt(rng, n);
  let r2 = randomInt(rng, n);
  while (r2 === i || r2 === r1) r2 = randomInt(rng, n);
  let r3 = randomInt(rng, n);
  while (r3 === i || r3 === r1 || r3 === r2) r3 = randomInt(rng, n);
  return [r1, r2, r3];
}

/**
 * One trial per member: mutant v = x_r1 + F·(x_r2 − x_r3), binomial crossover with rate CR and one
 * forced gene from the mutant, bounds repaired. Not evaluated. `out` buffers are reused when given.
 */
export function makeTrials(
  pop: Population,
  problem: DEProblem,
  rng: Rng,
  options: TrialOptions,
  out?: Float64Array[],
): Float64Array[] {
  const { F, CR } = options;
  const repair = options.repair ?? 'resample';
  const n = pop.x.length;
  const d = problem.dimension;
  const trials = out ?? [];
  for (let i = 0; i < n; i += 1) {
    const [r1, r2, r3] = pickThree(n, i, rng);
    const a = pop.x[r1];
    const b = pop.x[r2];
    const c = pop.x[r3];
    const parent = pop.x[i];
    const t = trials[i] && trials[i].length === d ? trials[i] : new Float64Array(d);
    const forced = randomInt(rng, d);
    for (let j = 0; j < d; j += 1) {
      if (j === forced || rng() < CR) {
        const v = a[j] + F * (b[j] - c[j]);
        t[j] = repairGene(v, parent[j], problem.lower[j], problem.upper[j], rng, repair);
      } else {
        t[j] = parent[j];
      }
    }
    trials[i] = t;
  }
  trials.length = n;
  return trials;
}

/**
 * Greedy one-to-one selection: a trial replaces its parent when it is at least as good (Storn & Price
 * accept ties, which lets the search drift across plateaus). The replaced parent's buffer is swapped
 * into `trials[i]` so the caller can reuse it. Returns the number of replacements.
 */
export function selectTrials(pop: Population, trials: Float64Array[], trialFit: Fitness[]): number {
  let replaced = 0;
  for (let i = 0; i < pop.x.length; i += 1) {
    if (compareFitness(trialFit[i], pop.fit[i]) <= 0) {
      const old = pop.x[i];
      pop.x[i] = trials[i];
      trials[i] = old;
      pop.fit[i] = trialFit[i];
      replaced += 1;
    }
  }
  return replaced;
}

/** Index of the best member (first one on ties, so the answer is deterministic). */
export function bestIndex(pop: Population): number {
  let best = 0;
  for (let i = 1; i < pop.fit.length; i += 1) if (compareFitness(pop.fit[i], pop.fit[best]) < 0) best = i;
  return best;
}
