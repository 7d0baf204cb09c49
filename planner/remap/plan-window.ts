// Plans one maintenance window: builds the re-mapping problem, searches it (serial DE or greedy here; the
// parallel and exact modes through injected runners), then scores and verifies the result.
import { runDE, type DETracePoint } from '../de/differential-evolution';
import { InvalidOptionError, PlannerError } from '../errors';
import { greedyPlan } from '../greedy/greedy-plan';
import type { Inventory, PlanResult, SlicePlacement, TracePoint, WindowSpec } from '../model/types';
import { compareObjectives, evaluatePlan, toSlicePlans } from '../plan/evaluate-plan';
import { createRng, deriveSeed } from '../random/rng';
import { verifyPlan } from '../verify/verify-plan';
import { createDecoder, objectiveFromFitness, stayPutGenes, toDEProblem, type Decoder } from './decoder';
import { explainUnresolved } from './explain-unresolved';
import { PLAN_DEFAULTS, type PlanOptions } from './plan-options';
import { buildRemapProblem } from './problem';
import { finalPlan } from './knock-on-reasons';
import { iterateLocalSearch } from './kicks';
import { localSearch } from './local-search';
import { perturbedSeeds } from './seeding';
import type { RemapProblem } from './remap-types';

export { PLAN_DEFAULTS, type PlanOptions, type SearchProgress, type ExactSolver, type ExactOutcome } from './plan-options';

/** rng stream for the initial members, apart from the DE's own stream */
const SEEDING_STREAM = 0x5eed;
/** rng stream for the kicks of the iterated local search */
const KICK_STREAM = 0x61c4;
const MODES = new Set(['serial', 'islands', 'shared-eval', 'greedy', 'exact']);

interface Search {
  next: Map<number, SlicePlacement | null>;
  trace: TracePoint[];
  exact?: PlanResult['exact'];
  /** decoder fitness of the found genes */
  feasible?: boolean;
  /** the genes that decode to `next` (DE modes) */
  genes?: Float64Array;
  /** DE modes: the search's own result before any fallback */
  alone?: PlanResult['search'];
  /** DE modes: the greedy plan's score and the time to get it (see PlanResult.greedy) */
  greedy?: PlanResult['greedy'];
  /** DE modes: why the search ended and the generations it evolved (see PlanResult.stoppedBy) */
  stoppedBy?: PlanResult['stoppedBy'];
  generations?: number;
}

function toTrace(points: DETracePoint[]): TracePoint[] {
  return points.map((p) => ({
    generation: p.generation, evaluations: p.evaluations, best: objectiveFromFitness(p.best), feasible: p.best.violation <= 0,
  }));
}

/**
 * Genes a trial takes from its mutant, on average, at most: on a window touching thousands of slices the
 * genome has tens of thousands of genes, and CR = 0.1 would re-draw most slices in every trial (almost every
 * such trial loses to its parent, and none can be evaluated incrementally). Capping the expected count keeps
 * trials a few slices away from their parents, as on small windows. Genomes up to MAX_TRIAL_GENES / CR genes
 * (320 at the default CR) keep the given CR.
 */
export const MAX_TRIAL_GENES = 32;

export function crossoverRate(problem: Pick<RemapProblem, 'dimension'>, CR: number): number {
  return Math.min(CR, MAX_TRIAL_GENES / Math.max(1, problem.dimension));
}

/**
 * Genomes longer than this many genes get a smaller population, in proportion (never below BIG_MIN_POPULATION):
 * a window touching a thousand slices has over 10,000 genes, every trial still replays every slice's decode
 * (tens of milliseconds), and with the full population the search ran only a handful of generations in its
 * limit. Its members are near-copies of the greedy and stay-put plans either way, so generations — steps of
 * improvement — count for more there than the population's breadth.
 */
export const BIG_GENOME_GENES = 2000;
const BIG_MIN_POPULATION = 6;

export function populationFor(problem: Pick<RemapProblem, 'dimension'>, population: number): number {
  if (problem.dimension <= BIG_GENOME_GENES) return population;
  return Math.min(population, Math.max(BIG_MIN_POPULATION, Math.floor((population * BIG_GENOME_GENES) / problem.dimension)));
}

/** Serial DE, or the parallel runner; both seeded with stay-put and greedy genes. */
async function evolve(problem: RemapProblem, decoder: Decoder, o: PlanOptions, seeds: Float64Array[], startMs: number, now: () => number): Promise<Search> {
  const timeLimitMs = Math.max(0, o.timeLimitMs * (1 - FINAL_POLISH_SHARE) - finishMs(problem, o) - (now() - startMs));
  const report = (generation: number, evaluations: number, best: TracePoint['best']) =>
    o.onProgress?.({ generation, evaluations, best, elapsedMs: now() - startMs });
  const de = {
    population: populationFor(problem, o.population), F: o.F, CR: crossoverRate(problem, o.CR), generations: o.generations,
    stallGenerations: o.stallGenerations, timeLimitMs,
  };
  if (o.mode === 'serial') {
    const r = runDE(toDEProblem(problem, decoder, { incremental: true }), {
      ...de, now, onGeneration: (g, best, evaluations) => report(g, evaluations, objectiveFromFitness(best)),
    }, createRng(o.seed), seeds);
    return {
      next: decoder.decode(r.best).next, trace: toTrace(r.trace), feasible: r.fitness.violation <= 0, genes: r.best,
      stoppedBy: r.stoppedBy, generations: r.generations,
    };
  }
  if (!o.parallel || !o.scenario) throw new InvalidOptionError(`mode "${o.mode}" needs options.parallel and options.scenario`);
  const r = await o.parallel.run({
    mode: o.mode === 'islands' ? 'islands' : 'shared-eval', scenario: o.scenario, window: problem.window,
    problemOptions: problem.options,
    // Islands are memetic: each worker polishes its island's best after every epoch, so the local search, the
    // larger share of the work on scarce windows, runs on every worker at once.
    deOptions: { ...de, migrationInterval: o.migrationInterval, ...(o.mode === 'islands' ? { polishEvaluations: islandPolishBudget(problem) } : {}) },
    seeds, seed: o.seed, workers: o.workers,
    onGeneration: (p) => report(p.generation, p.evaluations, objectiveFromFitness(p.best)),
  });
  const decoded = decoder.decode(r.best);
  // The runner does not say why it ended: the budget when it evolved every generation, time when its limit had
  // passed, the stall limit otherwise.
  const generations = r.trace.at(-1)?.generation ?? 0;
  const stoppedBy = generations >= o.generations ? 'generations' : now() - startMs >= o.timeLimitMs * (1 - FINAL_POLISH_SHARE) - finishMs(problem, o) ? 'time' : 'stall';
  return { next: decoded.next, trace: toTrace(r.trace), feasible: decoded.fitness.violation <= 0, genes: r.best, stoppedBy, generations };
}

/**
 * Slices a wide initial member re-draws at most: a fifth of a window touching a thousand slices is hundreds of
 * new end-site pairs per member, each a path search the first time, and the first population alone then took
 * the whole time limit.
 */
const WIDE_MAX_SLICES = 30;

/** Stay-put and greedy first, then perturbed copies of them (a few slices re-drawn, or many for a quarter). */
function initialMembers(problem: RemapProblem, greedyGenes: Float64Array, o: PlanOptions): Float64Array[] {
  const bases = [greedyGenes, stayPutGenes(problem)];
  const rest = Math.max(0, populationFor(problem, o.population) - bases.length);
  const near = Math.floor((rest * 3) / 4);
  const rng = createRng(deriveSeed(o.seed, SEEDING_STREAM));
  // The last quarter re-draws up to a fifth of the slices, for diversity. Uniformly random members would be
  // hopeless on a genome this size, and on large windows each costs a path search for nearly every tie.
  const wide = Math.min(WIDE_MAX_SLICES, Math.max(3, Math.ceil(problem.slices.length / 5)));
  return [...bases, ...perturbedSeeds(problem, bases, near, rng), ...perturbedSeeds(problem, bases, rest - near, rng, wide)];
}

/** Decodes per local search: a few passes over the genome. */
function polishBudget(problem: RemapProblem): number {
  return Math.max(200, 4 * problem.dimension);
}

/** Decodes per island epoch's local search: a share of one full local search. */
function islandPolishBudget(problem: RemapProblem): number {
  return Math.ceil(polishBudget(problem) / 4);
}

/**
 * Shares of the time limit: the greedy seed's hill-climb may use the first SEED_POLISH_SHARE, DE runs until
 * FINAL_POLISH_SHARE is left, and the final hill-climb takes the rest. On large windows a full hill-climb
 * costs thousands of decodes, so without these the time limit would not hold.
 */
const SEED_POLISH_SHARE = 0.15;
const FINAL_POLISH_SHARE = 0.15;
/** Left at the end for scoring, explaining and verifying the plan, so the whole run keeps its time limit. */
const FINISH_SHARE = 0.03;
/**
 * …and at least this long per block: scoring, explaining and verifying a plan, then the review, grow with the
 * slices re-placed (about 2 s for 1,400 slices on a shared core), which 3 % of a 20 s limit does not cover.
 */
const FINISH_MS_PER_BLOCK = 1.5;

function finishMs(problem: RemapProblem, o: PlanOptions): number {
  return Math.min(o.timeLimitMs / 4, Math.max(o.timeLimitMs * FINISH_SHARE, FINISH_MS_PER_BLOCK * problem.slices.length));
}

function polishFound(problem: RemapProblem, decoder: Decoder, found: Search, budget: number, o: PlanOptions, timeUp: () => boolean): Search {
  if (!found.genes) return found;
  const polished = localSearch(problem, decoder, found.genes, budget, timeUp);
  const p = iterateLocalSearch(problem, decoder, polished.genes, Math.ceil(budget / 2), createRng(deriveSeed(o.seed, KICK_STREAM)), timeUp);
  const decoded = decoder.decode(p.genes);
  return { ...found, next: decoded.next, feasible: decoded.fitness.violation <= 0, genes: p.genes };
}

async function search(problem: RemapProblem, o: PlanOptions, startMs: number, now: () => number): Promise<Search> {
  const decoder = createDecoder(problem);
  const greedyStartMs = now();
  const greedy = greedyPlan(problem);
  const greedyMs = now() - greedyStartMs;
  const greedyFit = decoder.evaluate(greedy.genes);
  const greedyPoint: TracePoint = { generation: 0, evaluations: 1, best: objectiveFromFitness(greedyFit), feasible: greedyFit.violation <= 0 };
  if (o.mode === 'greedy' || problem.slices.length === 0) return { next: greedy.next, trace: [greedyPoint] };
  if (o.mode === 'exact') {
    if (!o.exact) throw new InvalidOptionError('mode "exact" needs options.exact');
    const r = await o.exact(problem, { timeLimitMs: o.timeLimitMs });
    return { next: r.next, trace: [], exact: r.exact };
  }
  // Memetic steps around DE (same in every DE mode, so shared-eval still follows serial exactly): the greedy
  // seed is local-searched first; DE's best is local-searched at the end, then kicked and searched again.
  const budget = o.polishEvaluations ?? polishBudget(problem);
  // A polish that finds its time up is cut short: the search then ended by time, whatever stopped DE.
  let polishCut = false;
  const until = (limitMs: number) => () => {
    const up = now() - startMs >= limitMs;
    if (up) polishCut = true;
    return up;
  };
  // A run bounded by counts (polishEvaluations set) keeps the time limit as a cap on the whole run only: its seed
  // polish is not also held to a share of it, which a short cap and a busy machine would otherwise cut.
  const seedLimitMs = o.polishEvaluations === undefined ? o.timeLimitMs * SEED_POLISH_SHARE : o.timeLimitMs - finishMs(problem, o);
  const seed = localSearch(problem, decoder, greedy.genes, budget, until(seedLimitMs)).genes;
  const evolved = await evolve(problem, decoder, o, initialMembers(problem, seed, o), startMs, now);
  const found = polishFound(problem, decoder, evolved, budget, o, until(o.timeLimitMs - finishMs(problem, o)));
  if (polishCut) found.stoppedBy = 'time';
  // The product keeps the better of the search's plan and greedy's; `alone` records the search's own figures,
  // so benchmarks and tests judge the search, not the fallback.
  const score = (next: Map<number, SlicePlacement | null>) =>
    evaluatePlan(problem.inv, problem.window, finalPlan(problem, next).next, problem.options.reservations);
  const own = score(found.next);
  const scoreStartMs = now();
  const greedyObjective = score(greedy.next);
  const greedyRun = { objective: greedyObjective, elapsedMs: (greedyStartMs - startMs) + greedyMs + (now() - scoreStartMs) };
  const better = found.feasible === true && compareObjectives(own, greedyObjective) <= 0;
  const alone = { objective: own, feasible: found.feasible === true, usedFallback: better ? null : ('greedy' as const) };
  return better ? { ...found, alone, greedy: greedyRun } : { ...found, next: greedy.next, alone, greedy: greedyRun };
}

function checkOptions(o: PlanOptions): void {
  if (!MODES.has(o.mode)) throw new InvalidOptionError(`unknown mode "${String(o.mode)}"`);
  if (!Number.isFinite(o.seed)) throw new InvalidOptionError('seed must be a finite number');
  if (!(o.timeLimitMs > 0)) throw new InvalidOptionError('timeLimitMs must be greater than 0');
}

export async function planWindow(inv: Inventory, window: WindowSpec, options: Partial<PlanOptions> = {}): Promise<PlanResult> {
  const o: PlanOptions = { ...PLAN_DEFAULTS, ...options };
  checkOptions(o);
  const now = o.now ?? Date.now;
  const startMs = now();
  const problem = buildRemapProblem(inv, window, {
    reservations: o.reservations, pinned: o.pinned, excludedSites: o.excludedSites, maxCandidates: o.maxCandidates,
    ...(o.knockOn && o.maxKnockOnMoves > 0 ? { knockOn: { maxMoves: o.maxKnockOnMoves } } : {}),
  });
  const found = await search(problem, o, startMs, now);
  const affected = problem.affected.map((s) => inv.slices[s].id);
  const plan = finalPlan(problem, found.next);
  const slices = toSlicePlans(inv, plan.next, explainUnresolved(problem, found.next));
  for (const entry of slices) {
    const touched = plan.madeRoomFor.get(inv.sliceIndex.get(entry.slice)!);
    if (touched) entry.madeRoomFor = touched.map((s) => inv.slices[s].id);
  }
  const verdict = verifyPlan(inv, window, { affected, slices }, o.reservations);
  if (!verdict.ok) {
    const first = verdict.violations[0];
    throw new PlannerError('PLAN_UNVERIFIED', `plan for window "${window.id}" fails verification: ${first.code} ${first.message}`);
  }
  const result: PlanResult = {
    window: window.id, mode: o.mode, seed: o.seed, elapsedMs: now() - startMs, affected, slices,
    objective: evaluatePlan(inv, window, plan.next, o.reservations), trace: found.trace,
  };
  if (found.exact) result.exact = found.exact;
  if (found.alone) result.search = found.alone;
  if (found.greedy) result.greedy = found.greedy;
  if (found.stoppedBy) result.stoppedBy = found.stoppedBy;
  if (found.generations !== undefined) result.generations = found.generations;
  return result;
}
