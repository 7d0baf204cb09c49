// Which placed slices stand in the way of an unresolved one: those holding capacity on the spans of its candidate
// paths, or on its chosen sites, where too little is left for it. The local search decodes them after it.
import { fits } from '../model/tolerance';
import type { SlicePlacement } from '../model/types';
import { geneIndex } from './place-slice';
import type { RemapProblem } from './remap-types';

/** Candidate paths read per tie of the unresolved slice. */
const PATHS_READ = 3;

/** The site each function's gene picks (before any repair). */
export function pickedSites(problem: RemapProblem, genes: Float64Array, block: number): number[] {
  return problem.slices[block].functions.map((k) => {
    const f = problem.functions[k];
    return f.candidates[geneIndex(genes[f.gene], f.candidates.length, f.candidates.length)] ?? -1;
  });
}

/** Gene values that pick each catalogue path of a tie between the sites its slice's genes pick. */
export function pathGeneValues(problem: RemapProblem, genes: Float64Array, block: number, tieIndex: number): number[] {
  const t = problem.ties[tieIndex];
  const info = problem.inv.slices[t.slice].ties[t.tie];
  const sites = pickedSites(problem, genes, block);
  if (sites[info.from] < 0 || sites[info.to] < 0) return [];
  const n = problem.paths.get(t.slice, t.tie, sites[info.from], sites[info.to]).count();
  return Array.from({ length: n }, (_, i) => i + 0.5);
}

function freeCapacity(problem: RemapProblem, next: Map<number, SlicePlacement | null>) {
  const cpu = Float64Array.from(problem.residualCpu);
  const gbps = Float64Array.from(problem.residualGbps);
  for (const [s, p] of next) {
    if (!p) continue;
    problem.inv.slices[s].functions.forEach((f, fn) => { cpu[p.sites[fn]] -= f.cpu; });
    problem.inv.slices[s].ties.forEach((t, tie) => { for (const x of p.paths[tie]) gbps[x] -= t.bandwidthGbps; });
  }
  return { cpu, gbps };
}

/** Block indices of the placed slices blocking block `u`, most capacity held on its scarce elements first. */
export function blockersOf(problem: RemapProblem, next: Map<number, SlicePlacement | null>, genes: Float64Array, u: number): number[] {
  const free = freeCapacity(problem, next);
  const slice = problem.inv.slices[problem.slices[u].slice];
  const sites = pickedSites(problem, genes, u);
  const scarceSpans = new Set<number>();
  const scarceSites = new Set<number>();
  slice.functions.forEach((f, fn) => { if (sites[fn] >= 0 && !fits(f.cpu, free.cpu[sites[fn]])) scarceSites.add(sites[fn]); });
  slice.ties.forEach((t, tie) => {
    if (sites[t.from] < 0 || sites[t.to] < 0) return;
    const list = problem.paths.get(problem.slices[u].slice, tie, sites[t.from], sites[t.to]);
    for (let i = 0; i < Math.min(PATHS_READ, list.count()); i += 1) {
      for (const x of list.at(i)!.spans) if (!fits(t.bandwidthGbps, free.gbps[x])) scarceSpans.add(x);
    }
  });
  const scored: [number, number][] = [];
  problem.slices.forEach((block, b) => {
    const p = next.get(block.slice);
    if (b === u || !p) return;
    const info = problem.inv.slices[block.slice];
    let score = 0;
    info.functions.forEach((f, fn) => { if (scarceSites.has(p.sites[fn])) score += f.cpu; });
    info.ties.forEach((t, tie) => { for (const x of p.paths[tie]) if (scarceSpans.has(x)) score += t.bandwidthGbps; });
    if (score > 0) scored.push([b, score]);
  });
  return scored.sort((a, b) => b[1] - a[1] || a[0] - b[0]).map(([b]) => b);
}
