// Brute-force optimum of a tiny re-mapping problem: every keep-out choice, every candidate site per
// function, every simple path per tie (own depth-first enumeration, independent of the planner's path code).
// Exact by construction; the reference the HiGHS model is checked against.
import type { SlicePlacement } from '../../../planner/model/types';
import { REROUTE_COST, sliceWeight } from '../../../planner/plan/evaluate-plan';
import type { RemapProblem } from '../../../planner/remap/remap-types';

export interface BruteOptimum {
  key: [number, number, number];
  next: Map<number, SlicePlacement | null>;
  combinations: number;
}

const EPS = 1e-9;

function simplePaths(p: RemapProblem, from: number, to: number): number[][] {
  const out: number[][] = [];
  const net = p.inv.network;
  const onPath = new Set([from]);
  const walk = (site: number, spans: number[]) => {
    if (site === to) return void out.push([...spans]);
    net.spans.forEach((s, i) => {
      if (p.spanDown[i] || (s.a !== site && s.b !== site)) return;
      const next = s.a === site ? s.b : s.a;
      if (onPath.has(next) || p.siteDown[next]) return;
      onPath.add(next);
      walk(next, [...spans, i]);
      onPath.delete(next);
    });
  };
  if (from === to) return [[]];
  walk(from, []);
  return out;
}

function lessKey(a: number[], b: number[]): boolean {
  if (!Number.isFinite(b[0])) return true;
  for (let i = 0; i < a.length; i += 1) {
    const tol = EPS * Math.max(1, Math.abs(a[i]), Math.abs(b[i]));
    if (a[i] < b[i] - tol) return true;
    if (a[i] > b[i] + tol) return false;
  }
  return false;
}

/** All feasible placements of one slice on top of the given loads, each with its cost parts. */
function options(p: RemapProblem, slice: number, cands: Int32Array[]): { placement: SlicePlacement; move: number; usage: number }[] {
  const s = p.inv.slices[slice];
  const cur = p.inv.placements[slice];
  const out: { placement: SlicePlacement; move: number; usage: number }[] = [];
  const sitesCombos: number[][] = [[]];
  for (const c of cands) {
    const grown: number[][] = [];
    for (const partial of sitesCombos) for (const site of c) grown.push([...partial, site]);
    sitesCombos.splice(0, sitesCombos.length, ...grown);
  }
  for (const sites of sitesCombos) {
    let pathCombos: number[][][] = [[]];
    for (const t of s.ties) {
      const ok = simplePaths(p, sites[t.from], sites[t.to]).filter((path) => {
        const lat = path.reduce((a, x) => a + p.inv.network.spans[x].latencyMs, 0);
        const av = path.reduce((a, x) => a * p.inv.network.spans[x].availability, 1);
        return lat <= t.maxLatencyMs && (t.minAvailability === undefined || av >= t.minAvailability);
      });
      pathCombos = pathCombos.flatMap((pc) => ok.map((path) => [...pc, path]));
    }
    for (const paths of pathCombos) {
      let move = 0;
      s.functions.forEach((f, i) => (move += sites[i] !== cur.sites[i] ? f.moveCost : 0));
      paths.forEach((path, i) => (move += path.join() !== cur.paths[i].join() ? REROUTE_COST : 0));
      const usage = paths.reduce((a, path, i) => a + s.ties[i].bandwidthGbps * path.reduce((l, x) => l + p.inv.network.spans[x].latencyMs, 0), 0);
      out.push({ placement: { sites, paths }, move, usage });
    }
  }
  return out;
}

/** The optimum, or null when the search space exceeds `maxCombinations` (the caller picks another instance). */
export function bruteForce(p: RemapProblem, maxCombinations = 50_000): BruteOptimum | null {
  const blocks = p.slices.map((b) => ({
    slice: b.slice,
    choices: b.blockedReason !== undefined ? [] : options(p, b.slice, b.functions.map((k) => p.functions[k].candidates)),
  }));
  if (blocks.reduce((n, b) => n * (1 + b.choices.length), 1) > maxCombinations) return null;
  const cpu = Float64Array.from(p.residualCpu);
  const gbps = Float64Array.from(p.residualGbps);
  const chosen = new Map<number, SlicePlacement | null>();
  let best: BruteOptimum = { key: [Infinity, Infinity, Infinity], next: new Map(), combinations: 0 };
  let combinations = 0;
  const claim = (slice: number, pl: SlicePlacement, sign: number) => {
    const s = p.inv.slices[slice];
    s.functions.forEach((f, i) => (cpu[pl.sites[i]] -= sign * f.cpu));
    s.ties.forEach((t, i) => pl.paths[i].forEach((x) => (gbps[x] -= sign * t.bandwidthGbps)));
  };
  // A resource fits when nothing is claimed on it beyond its residual (one left untouched always fits).
  const ok = (left: Float64Array, residual: Float64Array) =>
    left.every((v, i) => v === residual[i] || v >= -EPS * Math.max(1, Math.abs(residual[i])));
  const fitsAll = () => ok(cpu, p.residualCpu) && ok(gbps, p.residualGbps);
  const walk = (i: number, key: [number, number, number]) => {
    if (i === blocks.length) {
      combinations += 1;
      if (lessKey(key, best.key)) best = { key: [...key], next: new Map(chosen), combinations: 0 };
      return;
    }
    const b = blocks[i];
    chosen.set(b.slice, null);
    walk(i + 1, [key[0] + sliceWeight(p.inv.slices[b.slice].priority), key[1], key[2]]);
    for (const c of b.choices) {
      claim(b.slice, c.placement, 1);
      if (fitsAll()) {
        chosen.set(b.slice, c.placement);
        walk(i + 1, [key[0], key[1] + c.move, key[2] + c.usage]);
      }
      claim(b.slice, c.placement, -1);
    }
    chosen.delete(b.slice);
  };
  walk(0, [0, 0, 0]);
  return { ...best, combinations };
}
