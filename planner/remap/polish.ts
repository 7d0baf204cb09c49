// Memetic local improvement for the re-mapping genome: first-improvement hill climbing over single-gene
// changes of the slices that are not simply staying put (moved, rerouted or left out). DE's binomial
// crossover rarely lands the one exact gene value that saves a move; this step tries each of them.
// Memetic DE in the sense of Neri & Tirronen, "Recent advances in differential evolution: a survey and
// experimental analysis", Artif. Intell. Rev. 33 (2010) 61–106 (memory): DE plus a local search on members.
import { compareFitness, type Fitness } from '../de/fitness';
import type { Decoder } from './decoder';
import type { RemapProblem, RemapSlice } from './remap-types';

const KEEP_IN = 0.75;
const LEAVE_OUT = 0.25;
const CELL_MIDDLE = 0.5;

export interface Polished {
  genes: Float64Array;
  fitness: Fitness;
  evaluations: number;
}

interface Climb {
  problem: RemapProblem;
  decoder: Decoder;
  x: Float64Array;
  fit: Fitness;
  evaluations: number;
  maxEvaluations: number;
  /** the decoder's saved states are those of `x` for blocks up to this index */
  validThrough: number;
  /** block being climbed */
  block: number;
  /** true once the caller's time is up (checked before every decode) */
  timeUp: () => boolean;
}

function spent(c: Climb): boolean {
  return c.evaluations >= c.maxEvaluations || c.timeUp();
}

/** Sets gene j to v; keeps it when strictly better, else puts the old value back. */
function attempt(c: Climb, j: number, v: number): boolean {
  const old = c.x[j];
  if (old === v || spent(c)) return false;
  c.x[j] = v;
  if (accept(c)) return true;
  c.x[j] = old;
  return false;
}

/** Evaluates x (changed only in block c.block) from that block on; keeps the change when strictly better. */
function accept(c: Climb): boolean {
  const f = c.decoder.evaluateFrom(c.x, c.block);
  c.evaluations += 1;
  if (compareFitness(f, c.fit) >= 0) return false;
  c.fit = f;
  c.validThrough = c.block;
  return true;
}

/** Every function of the slice back on candidate 0 at once (its current site when usable). */
function attemptStayPut(c: Climb, block: RemapSlice): boolean {
  const genes = block.functions.map((k) => c.problem.functions[k].gene);
  const old = genes.map((j) => c.x[j]);
  if (old.every((v) => Math.floor(v) === 0) || spent(c)) return false;
  for (const j of genes) c.x[j] = CELL_MIDDLE;
  if (accept(c)) return true;
  genes.forEach((j, i) => { c.x[j] = old[i]; });
  return false;
}

/** Single-gene moves within one slice's block; true when any of them helped. */
function climbSlice(c: Climb, b: number): boolean {
  const block = c.problem.slices[b];
  if (b > c.validThrough) {
    c.decoder.evaluateSaving(c.x);
    c.evaluations += 1;
    c.validThrough = c.problem.slices.length - 1;
  }
  c.block = b;
  let improved = false;
  if (c.x[block.keepGene] < 0.5) improved = attempt(c, block.keepGene, KEEP_IN) || improved;
  else if (c.fit.violation > 0) improved = attempt(c, block.keepGene, LEAVE_OUT) || improved;
  improved = attemptStayPut(c, block) || improved;
  for (const k of block.functions) {
    const f = c.problem.functions[k];
    for (let i = 0; i < f.candidates.length; i += 1) {
      if (Math.floor(c.x[f.gene]) !== i) improved = attempt(c, f.gene, i + CELL_MIDDLE) || improved;
    }
  }
  return improved;
}

/** Slices whose decoded placement differs from today's (moved, rerouted or left out). */
function changedSlices(c: Climb): number[] {
  const { next } = c.decoder.decode(c.x);
  const out: number[] = [];
  c.problem.slices.forEach((block, b) => {
    if (block.blockedReason !== undefined) return;
    const p = next.get(block.slice);
    const cur = c.problem.inv.placements[block.slice];
    if (!p || p.sites.some((s, i) => s !== cur.sites[i])
      || p.paths.some((path, i) => path.length !== cur.paths[i].length || path.some((s, k) => s !== cur.paths[i][k]))) out.push(b);
  });
  return out;
}

/**
 * Hill-climbs from `start` until no single change helps, `maxEvaluations` decodes are spent, or `timeUp()`
 * says the caller's time is over. Deterministic whenever it finishes before the time is up.
 */
export function polish(
  problem: RemapProblem, decoder: Decoder, start: Float64Array, maxEvaluations: number, timeUp: () => boolean = () => false,
): Polished {
  const c: Climb = {
    problem, decoder, x: Float64Array.from(start), fit: decoder.evaluate(start), evaluations: 1, maxEvaluations,
    validThrough: -1, block: 0, timeUp,
  };
  let improved = true;
  while (improved && !spent(c)) {
    improved = false;
    for (const b of changedSlices(c)) improved = climbSlice(c, b) || improved;
  }
  return { genes: c.x, fitness: c.fit, evaluations: c.evaluations };
}
