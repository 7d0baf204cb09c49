// Island model across worker threads: the population is split into one island per worker; every
// `migrationInterval` generations each island sends its best member to the next island on a ring.
// Deterministic per seed: islands have their own random streams and migrate at fixed generations, so
// thread timing never changes the result (only a time limit that actually triggers can).
import { compareFitness } from '../de/differential-evolution';
import { deriveSeed } from '../random/rng';
import type { ParallelRunInput, ParallelRunResult } from '../remap/parallel-runner';
import type { RemapWorker } from './worker-pool';
import type { IslandReport, Member } from './worker-protocol';

const DEFAULT_MIGRATION_INTERVAL = 10;
const MIN_ISLAND = 4;

/** Island sizes that add up to the total population (none below DE's minimum of 4). */
export function islandSizes(population: number, workers: number): number[] {
  const count = Math.max(1, Math.min(workers, Math.floor(population / MIN_ISLAND)));
  return Array.from({ length: count }, (_, i) => Math.floor(population / count) + (i < population % count ? 1 : 0));
}

function bestOf(members: Member[]): Member {
  return members.reduce((a, b) => (compareFitness(b.fitness, a.fitness) < 0 ? b : a));
}

export async function runIslands(input: ParallelRunInput, workers: RemapWorker[]): Promise<ParallelRunResult> {
  const o = input.deOptions;
  const startMs = Date.now();
  const deadlineMs = o.timeLimitMs === undefined ? undefined : startMs + o.timeLimitMs;
  const sizes = islandSizes(o.population, workers.length);
  const islands = workers.slice(0, sizes.length);
  const inits = await Promise.all(islands.map((w, i) =>
    w.request<{ best: Member; evaluations: number }>({ kind: 'island-init', size: sizes[i], seeds: input.seeds, rngSeed: deriveSeed(input.seed, i) })));
  let evaluations = inits.reduce((s, r) => s + r.evaluations, 0);
  let bests = inits.map((r) => r.best);
  let best = bestOf(bests);
  const trace = [{ generation: 0, evaluations, best: best.fitness }];
  input.onGeneration?.({ generation: 0, evaluations, best: best.fitness, bestGenes: best.genes });
  const interval = Math.max(1, o.migrationInterval ?? DEFAULT_MIGRATION_INTERVAL);
  let generation = 0;
  let stall = 0;
  while (generation < o.generations) {
    if (deadlineMs !== undefined && Date.now() >= deadlineMs) break;
    if (o.stallGenerations !== undefined && stall >= o.stallGenerations) break;
    const n = Math.min(interval, o.generations - generation);
    const sent = bests;
    const reports = await Promise.all(islands.map((w, i) => w.request<IslandReport>({
      kind: 'island-run', generations: n, F: o.F, CR: o.CR, repair: o.repair, deadlineMs, polishEvaluations: o.polishEvaluations,
      // Ring: island i receives the best of island i − 1 (none on the first epoch or with one island).
      immigrant: generation > 0 && islands.length > 1 ? sent[(i + islands.length - 1) % islands.length] : undefined,
    })));
    const ran = Math.min(...reports.map((r) => r.perGeneration.length));
    let bestFit = best.fitness;
    for (let g = 0; g < ran; g += 1) {
      evaluations += o.population;
      const genBest = reports.map((r) => r.perGeneration[g]).reduce((a, b) => (compareFitness(b, a) < 0 ? b : a));
      stall = compareFitness(genBest, bestFit) < 0 ? 0 : stall + 1;
      if (compareFitness(genBest, bestFit) < 0) bestFit = genBest;
      generation += 1;
      trace.push({ generation, evaluations, best: bestFit });
    }
    bests = reports.map((r) => r.best);
    // Islands keep their best (selection never loses it), so the best of the bests is the run's best.
    best = bestOf([best, ...bests]);
    input.onGeneration?.({ generation, evaluations, best: best.fitness, bestGenes: best.genes });
    if (ran < n) break;
  }
  return { best: best.genes, fitness: best.fitness, generations: generation, evaluations, trace };
}

