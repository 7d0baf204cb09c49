// Initial DE members around the known good plans: each is a copy of the stay-put or greedy genes with a
// few slices' genes re-drawn. Uniform random members of a genome this size are almost all hopeless, and
// DE/rand/1 differences between near-copies then touch just the slices where they differ — a local search.
import { randomInt, type Rng } from '../random/rng';
import type { RemapProblem } from './remap-types';

/** Slices re-drawn per perturbed member: 1 … MAX_REDRAWN. */
const MAX_REDRAWN = 3;

function redraw(problem: RemapProblem, genes: Float64Array, gene: number, rng: Rng): void {
  genes[gene] = problem.lower[gene] + rng() * (problem.upper[gene] - problem.lower[gene]);
}

/** Share of re-drawn site and path genes kept near the front of their lists (nearest sites, shortest paths). */
const NEAR_SHARE = 0.75;
const NEAR_CHOICES = 3;

/**
 * Mostly among the first few choices: good plans rarely send a function to its 16th-nearest site or a tie over
 * its 8th-shortest path, and every new choice of end sites costs a path search the first time it is decoded.
 */
function redrawNear(problem: RemapProblem, genes: Float64Array, gene: number, rng: Rng): void {
  if (rng() < NEAR_SHARE) genes[gene] = Math.min(problem.upper[gene], NEAR_CHOICES) * rng();
  else redraw(problem, genes, gene, rng);
}

function redrawSlice(problem: RemapProblem, genes: Float64Array, block: number, rng: Rng): void {
  const b = problem.slices[block];
  // Bias towards keeping the slice in: leaving slices out is rarely what improves a seed.
  if (b.keepGene >= 0) genes[b.keepGene] = 0.25 + 0.75 * rng();
  redraw(problem, genes, b.orderGene, rng);
  for (const k of b.functions) redrawNear(problem, genes, problem.functions[k].gene, rng);
  for (const k of b.ties) redrawNear(problem, genes, problem.ties[k].gene, rng);
}

/** `count` members, alternating between the bases, each with 1 … maxRedrawn (default 3) slices re-drawn. */
export function perturbedSeeds(problem: RemapProblem, bases: Float64Array[], count: number, rng: Rng, maxRedrawn = MAX_REDRAWN): Float64Array[] {
  const out: Float64Array[] = [];
  if (problem.slices.length === 0 || bases.length === 0) return out;
  for (let i = 0; i < count; i += 1) {
    const genes = Float64Array.from(bases[i % bases.length]);
    const redrawn = 1 + randomInt(rng, maxRedrawn);
    for (let k = 0; k < redrawn; k += 1) redrawSlice(problem, genes, randomInt(rng, problem.slices.length), rng);
    out.push(genes);
  }
  return out;
}
