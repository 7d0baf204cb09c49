// Memetic local search on the re-mapping genome, run on DE's seed and on DE's best (every DE mode; never the
// exact solver). Two passes until neither helps:
// - ejection chains: a touched slice left unresolved is tried first in the decode order, with each of its
//   paths and sites, and with the one or two slices that block it (touched or knock-on candidates) decoded right
//   after it, so they re-place around it when they can (the decoder's repair finds their alternatives);
// - cost climb: single-gene changes of the slices that moved, were rerouted or left out, toward cheaper plans.
// Reference: F. Glover, "Ejection chains, reference structures and alternating path methods for traveling
// salesman problems", Discrete Applied Mathematics 65 (1996) 223–253; memetic DE as surveyed by F. Neri and
// V. Tirronen, Artif. Intell. Rev. 33 (2010) 61–106 (memory).
import { compareFitness, type Fitness } from '../de/fitness';
import { blockersOf, pathGeneValues } from './blockers';
import { CELL_MIDDLE, KEEP_IN, type Decoder } from './decoder';
import type { SlicePlacement } from '../model/types';
import type { RemapProblem } from './remap-types';

export interface Polished {
  genes: Float64Array;
  fitness: Fitness;
  evaluations: number;
}

/** Candidate sites tried per function in one ejection step, and blockers (and pairs of them) per slice. */
const SITES_TRIED = 6;
const BLOCKERS_TRIED = 6;
/** Blockers whose own sites are also varied in one ejection step. */
const BLOCKERS_MOVED = 3;

/** A set of gene changes tried together. */
type Change = [gene: number, value: number][];

interface Climb {
  problem: RemapProblem;
  decoder: Decoder;
  x: Float64Array;
  fit: Fitness;
  evaluations: number;
  maxEvaluations: number;
  timeUp: () => boolean;
}

const spent = (c: Climb) => c.evaluations >= c.maxEvaluations || c.timeUp();

/** Applies `change` (genes of `blocks`); keeps it when strictly better, else puts the old values back. */
function attempt(c: Climb, change: Change, blocks: number[], fromSaved: boolean): boolean {
  if (spent(c)) return false;
  const old = change.map(([j]) => c.x[j]);
  if (change.every(([, v], i) => old[i] === v)) return false;
  for (const [j, v] of change) c.x[j] = v;
  const f = fromSaved ? c.decoder.evaluateFrom(c.x, blocks) : c.decoder.evaluate(c.x);
  c.evaluations += 1;
  if (compareFitness(f, c.fit) < 0) {
    c.fit = f;
    return true;
  }
  change.forEach(([j], i) => { c.x[j] = old[i]; });
  return false;
}

/** Keys below every other block's, in the order given: these blocks decode first. */
function frontKeys(c: Climb, blocks: number[]): Change {
  let min = 1;
  c.problem.slices.forEach((b, i) => { if (!blocks.includes(i)) min = Math.min(min, c.x[b.orderGene]); });
  return blocks.map((b, i) => [c.problem.slices[b].orderGene, (min * (i + 1)) / (blocks.length + 1)]);
}

interface Variant { change: Change; blocks: number[] }

/** Block `u` (with `base` applied) first in the decode order, then with one or two of its blockers after it. */
function ejectionChanges(c: Climb, u: number, base: Change, variants: Variant[] = []): Variant[] {
  const out = [{ change: [...base, ...frontKeys(c, [u])], blocks: [u] }, ...variants];
  const old = base.map(([j]) => c.x[j]);
  for (const [j, v] of base) c.x[j] = v;
  const blockers = blockersOf(c.problem, c.decoder.decode(c.x).next, c.x, u).slice(0, BLOCKERS_TRIED);
  base.forEach(([j], i) => { c.x[j] = old[i]; });
  for (const b of blockers) out.push({ change: [...base, ...frontKeys(c, [u, b])], blocks: [u, b] });
  // A blocker that must change site to make room (e.g. to sit with its neighbour, so its tie needs no span).
  for (const b of blockers.slice(0, BLOCKERS_MOVED)) {
    for (const k of c.problem.slices[b].functions) {
      const f = c.problem.functions[k];
      for (let i = 0; i < Math.min(SITES_TRIED, f.candidates.length); i += 1) {
        out.push({ change: [...base, ...frontKeys(c, [u, b]), [f.gene, i + CELL_MIDDLE]], blocks: [u, b] });
      }
    }
  }
  for (let i = 0; i < blockers.length; i += 1) {
    for (let j = i + 1; j < blockers.length; j += 1) {
      out.push({ change: [...base, ...frontKeys(c, [u, blockers[i], blockers[j]])], blocks: [u, blockers[i], blockers[j]] });
    }
  }
  return out;
}

/** An unresolved block kept in, first in order, with each of its paths and nearest sites, then its blockers. */
function placeChanges(c: Climb, u: number): Variant[] {
  const p = c.problem;
  const block = p.slices[u];
  const keep: Change = [[block.keepGene, KEEP_IN]];
  const front = [...keep, ...frontKeys(c, [u])];
  const variants: Variant[] = [];
  for (const k of block.ties) {
    for (const v of pathGeneValues(p, c.x, u, k)) variants.push({ change: [...front, [p.ties[k].gene, v]], blocks: [u] });
  }
  for (const k of block.functions) {
    const f = p.functions[k];
    for (let i = 0; i < Math.min(SITES_TRIED, f.candidates.length); i += 1) variants.push({ change: [...front, [f.gene, i + CELL_MIDDLE]], blocks: [u] });
  }
  return ejectionChanges(c, u, keep, variants);
}

/** A moved or rerouted block back on its first candidates (its current site and path where usable), first in order. */
function stayChanges(c: Climb, u: number): Variant[] {
  const p = c.problem;
  const block = p.slices[u];
  const stay: Change = [...block.functions.map((k): [number, number] => [p.functions[k].gene, CELL_MIDDLE]),
    ...block.ties.map((k): [number, number] => [p.ties[k].gene, CELL_MIDDLE])];
  return ejectionChanges(c, u, stay);
}

function tryVariants(c: Climb, variants: Variant[]): boolean {
  for (const { change, blocks } of variants) {
    if (spent(c)) return false;
    if (attempt(c, change, blocks, false)) return true;
  }
  return false;
}

/** One pass over the unresolved touched slices; true when any became placed (or the plan otherwise improved). */
function ejectionPass(c: Climb): boolean {
  const { next } = c.decoder.decode(c.x);
  let improved = false;
  c.problem.slices.forEach((block, u) => {
    if (!block.touched || block.blockedReason !== undefined || next.get(block.slice) !== null || spent(c)) return;
    improved = tryVariants(c, placeChanges(c, u)) || improved;
  });
  return improved;
}

/** One pass over the moved and rerouted blocks, dearest first: each tried back in place with its blockers after it. */
function stayPass(c: Climb): boolean {
  const changed = changedBlocks(c).filter(([, placed]) => placed !== null);
  const cost = (b: number, placed: SlicePlacement) => {
    const block = c.problem.slices[b];
    const info = c.problem.inv.slices[block.slice];
    const cur = c.problem.inv.placements[block.slice];
    return info.functions.reduce((sum, f, fn) => sum + (placed.sites[fn] === cur.sites[fn] ? 0 : f.moveCost), 0)
      + placed.paths.filter((path, t) => !samePath(path, cur.paths[t])).length * 0.25;
  };
  changed.sort((a, b) => cost(b[0], b[1]!) - cost(a[0], a[1]!) || a[0] - b[0]);
  let improved = false;
  for (const [u] of changed) {
    if (spent(c)) break;
    improved = tryVariants(c, stayChanges(c, u)) || improved;
  }
  return improved;
}

function samePath(a: readonly number[], b: readonly number[]): boolean {
  return a.length === b.length && a.every((x, i) => x === b[i]);
}

/** Blocks whose decoded placement differs from today's (moved, rerouted or left out), with that placement. */
function changedBlocks(c: Climb): [number, SlicePlacement | null][] {
  const { next } = c.decoder.decode(c.x);
  const out: [number, SlicePlacement | null][] = [];
  c.problem.slices.forEach((block, b) => {
    if (block.blockedReason !== undefined) return;
    const p = next.get(block.slice) ?? null;
    const cur = c.problem.inv.placements[block.slice];
    if (!p || p.sites.some((s, i) => s !== cur.sites[i]) || p.paths.some((path, i) => !samePath(path, cur.paths[i]))) out.push([b, p]);
  });
  return out;
}

/** Candidate sites tried for a function that moved, in the cost climb (nearest first). */
const SITES_CLIMBED = 4;
/** Candidate sites tried for the other function of a pair move. */
const PAIR_SITES_CLIMBED = 8;

/**
 * Single-gene moves within one block, and all of it back to stay-put at once; true when any helped. Only what
 * changed is climbed: a moved function's nearest candidates, a rerouted tie's catalogue paths.
 */
function climbBlock(c: Climb, b: number, placed: SlicePlacement | null): boolean {
  const p = c.problem;
  const block = p.slices[b];
  if (spent(c)) return false;
  c.decoder.evaluateSaving(c.x);
  c.evaluations += 1;
  let improved = false;
  const tryOne = (change: Change) => {
    if (attempt(c, change, [b], true)) {
      improved = true;
      c.decoder.evaluateSaving(c.x);
      c.evaluations += 1;
    }
  };
  if (block.keepGene >= 0) tryOne([[block.keepGene, c.x[block.keepGene] < 0.5 ? KEEP_IN : 0.25]]);
  tryOne([...block.functions.map((k): [number, number] => [p.functions[k].gene, CELL_MIDDLE]),
    ...block.ties.map((k): [number, number] => [p.ties[k].gene, CELL_MIDDLE])]);
  if (placed === null) return improved;
  const current = p.inv.placements[block.slice];
  block.functions.forEach((k, fn) => {
    if (placed.sites[fn] === current.sites[fn]) return;
    const f = p.functions[k];
    for (let i = 0; i < Math.min(SITES_CLIMBED, f.candidates.length); i += 1) if (Math.floor(c.x[f.gene]) !== i) tryOne([[f.gene, i + CELL_MIDDLE]]);
  });
  // Pairs: a moved function back home while another function of the slice moves instead (e.g. to sit with it).
  block.functions.forEach((k, fn) => {
    if (placed.sites[fn] === current.sites[fn]) return;
    block.functions.forEach((other, gn) => {
      if (gn === fn) return;
      const g = p.functions[other];
      for (let i = 0; i < Math.min(PAIR_SITES_CLIMBED, g.candidates.length); i += 1) {
        tryOne([[p.functions[k].gene, CELL_MIDDLE], [g.gene, i + CELL_MIDDLE]]);
      }
    });
  });
  block.ties.forEach((k, tie) => {
    if (samePath(placed.paths[tie], current.paths[tie])) return;
    for (const v of pathGeneValues(p, c.x, b, k)) tryOne([[p.ties[k].gene, v]]);
  });
  return improved;
}

/**
 * Improves `start` until no move helps, `maxEvaluations` decodes are spent, or `timeUp()` says the caller's time
 * is over. Deterministic whenever it finishes before the time is up.
 */
export function localSearch(
  problem: RemapProblem, decoder: Decoder, start: Float64Array, maxEvaluations: number, timeUp: () => boolean = () => false,
): Polished {
  const c: Climb = { problem, decoder, x: Float64Array.from(start), fit: decoder.evaluate(start), evaluations: 1, maxEvaluations, timeUp };
  let improved = true;
  while (improved && !spent(c)) {
    improved = ejectionPass(c);
    improved = stayPass(c) || improved;
    if (spent(c)) break;
    for (const [b, placed] of changedBlocks(c)) improved = climbBlock(c, b, placed) || improved;
  }
  return { genes: c.x, fitness: c.fit, evaluations: c.evaluations };
}
