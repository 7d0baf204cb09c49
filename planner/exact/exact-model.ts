// The re-mapping problem as a 0-1 integer program in CPLEX LP text, for HiGHS.
// Variables: u_s = slice s left unresolved; x_f_c = function f on candidate c; y_n = tie on one
// (from site, to site, path) option. Rows: each function placed once unless its slice is out; a tie's
// options agree with both end functions' sites; CPU per site and bandwidth per span within the residual.
import { REROUTE_COST, sliceWeight } from '../plan/evaluate-plan';
import type { SlicePlacement } from '../model/types';
import type { RemapProblem } from '../remap/remap-types';
import { tiePaths, type PathOption, type PathSetting } from './exact-paths';
import { exactWeights, type ExactWeights } from './exact-weights';

export interface TieVar {
  name: string;
  /** index into problem.slices */
  block: number;
  tie: number;
  /** end sites */
  a: number;
  b: number;
  option: PathOption;
}

export interface ExactModel {
  lp: string;
  weights: ExactWeights;
  tieVars: TieVar[];
  /** every tie lists all its simple paths, so the optimum is optimal for the whole candidate-site problem */
  complete: boolean;
  columns: number;
}

type Terms = [number, string][];

const num = (x: number) => (Number.isInteger(x) ? String(x) : x.toPrecision(15));

/** `t1 + t2 …`, a few terms per line (LP readers limit line length). */
function sum(terms: Terms): string {
  const parts = terms.map(([c, v], i) => `${c < 0 ? '-' : i === 0 ? '' : '+'} ${num(Math.abs(c))} ${v}`);
  const lines: string[] = [];
  for (let i = 0; i < parts.length; i += 8) lines.push(parts.slice(i, i + 8).join(' '));
  return lines.join('\n   ');
}

const row = (name: string, terms: Terms, op: string, rhs: number) => ` ${name}: ${sum(terms)} ${op} ${num(rhs)}`;

class Builder {
  objective: Terms = [];
  rows: string[] = [];
  binaries: string[] = [];
  fixedOut: string[] = [];
  cpu = new Map<number, Terms>();
  gbps = new Map<number, Terms>();
  tieVars: TieVar[] = [];
  complete = true;
  /** one "moved" flag per knock-on candidate, for the cap on knock-on moves */
  knockOnFlags: string[] = [];

  binary(name: string, cost: number): string {
    this.binaries.push(name);
    if (cost !== 0) this.objective.push([cost, name]);
    return name;
  }

  load(map: Map<number, Terms>, key: number, coef: number, name: string): void {
    const terms = map.get(key);
    if (terms) terms.push([coef, name]);
    else map.set(key, [[coef, name]]);
  }
}

/** `u` is the block's unresolved variable; knock-on candidates have none (they are always placed). */
function addFunctions(p: RemapProblem, w: ExactWeights, b: Builder, blockIndex: number, u: string | null): string[][] {
  const block = p.slices[blockIndex];
  return block.functions.map((k) => {
    const f = p.functions[k];
    const fn = p.inv.slices[f.slice].functions[f.fn];
    const current = p.inv.placements[f.slice].sites[f.fn];
    const names = Array.from(f.candidates, (site, c) => {
      const name = b.binary(`x${k}_${c}`, site === current ? 0 : w.move * fn.moveCost);
      b.load(b.cpu, site, fn.cpu, name);
      return name;
    });
    const out: Terms = u === null ? [] : [[1, u]];
    b.rows.push(row(`place${k}`, [...names.map((n): [number, string] => [1, n]), ...out], '=', 1));
    return names;
  });
}

function addTie(
  p: RemapProblem, w: ExactWeights, b: Builder, at: { block: number; tie: number }, x: string[][], setting: PathSetting, start?: SlicePlacement | null,
): void {
  const { block: blockIndex, tie } = at;
  const block = p.slices[blockIndex];
  const t = p.inv.slices[block.slice].ties[tie];
  const fromF = p.functions[block.functions[t.from]];
  const toF = p.functions[block.functions[t.to]];
  const fromRows: Terms[] = x[t.from].map((n) => [[-1, n]]);
  const toRows: Terms[] = x[t.to].map((n) => [[-1, n]]);
  fromF.candidates.forEach((a, ca) => toF.candidates.forEach((bSite, cb) => {
    const startHere = start && start.sites[t.from] === a && start.sites[t.to] === bSite ? start.paths[tie] : undefined;
    const paths = tiePaths(p, block.slice, tie, a, bSite, setting, startHere);
    if (!paths.complete) b.complete = false;
    for (const option of paths.options) {
      const cost = (option.changed ? w.move * REROUTE_COST : 0) + w.usage * t.bandwidthGbps * option.latencyMs;
      const name = b.binary(`y${b.tieVars.length}`, cost);
      b.tieVars.push({ name, block: blockIndex, tie, a, b: bSite, option });
      fromRows[ca].push([1, name]);
      toRows[cb].push([1, name]);
      for (const span of option.spans) b.load(b.gbps, span, t.bandwidthGbps, name);
    }
  }));
  fromRows.forEach((terms, c) => b.rows.push(row(`tf${blockIndex}_${tie}_${c}`, terms, '=', 0)));
  toRows.forEach((terms, c) => b.rows.push(row(`tt${blockIndex}_${tie}_${c}`, terms, '=', 0)));
}

/**
 * Knock-on candidate `i` counts as moved (m = 1) when any function leaves its current site or any tie changes
 * path: m ≥ each such variable. The cap row then bounds Σ m.
 */
function addKnockOnFlag(p: RemapProblem, b: Builder, i: number, x: string[][]): void {
  const m = b.binary(`m${i}`, 0);
  b.knockOnFlags.push(m);
  const block = p.slices[i];
  const changes: string[] = [];
  block.functions.forEach((k, fn) => {
    const current = p.inv.placements[block.slice].sites[p.functions[k].fn];
    p.functions[k].candidates.forEach((site, c) => { if (site !== current) changes.push(x[fn][c]); });
  });
  for (const y of b.tieVars) if (y.block === i && y.option.changed) changes.push(y.name);
  changes.forEach((v, n) => b.rows.push(row(`mv${i}_${n}`, [[1, m], [-1, v]], '>=', 0)));
}

/** Capacity rows, skipped where even every option at once fits (they cannot bind). */
function addCapacityRows(b: Builder, map: Map<number, Terms>, residual: Float64Array, prefix: string): void {
  for (const [key, terms] of [...map.entries()].sort((l, r) => l[0] - r[0])) {
    const total = terms.reduce((s, [c]) => s + c, 0);
    if (total > residual[key]) b.rows.push(row(`${prefix}${key}`, terms, '<=', residual[key]));
  }
}

/** `start` (e.g. the greedy plan) gets its paths listed, so it can seed the solver as a complete incumbent. */
export function buildExactModel(p: RemapProblem, setting: PathSetting, start?: Map<number, SlicePlacement | null>): ExactModel {
  const w = exactWeights(p);
  const b = new Builder();
  p.slices.forEach((block, i) => {
    const slice = p.inv.slices[block.slice];
    const u = block.touched ? b.binary(`u${i}`, w.unresolved * sliceWeight(slice.priority)) : null;
    if (u !== null && block.blockedReason !== undefined) {
      b.fixedOut.push(u);
      return;
    }
    const x = addFunctions(p, w, b, i, u);
    slice.ties.forEach((_t, tie) => addTie(p, w, b, { block: i, tie }, x, setting, start?.get(block.slice)));
    if (!block.touched) addKnockOnFlag(p, b, i, x);
  });
  if (b.knockOnFlags.length > 0) b.rows.push(row('knockon', b.knockOnFlags.map((m): [number, string] => [1, m]), '<=', p.maxKnockOnMoves));
  addCapacityRows(b, b.cpu, p.residualCpu, 'cpu');
  addCapacityRows(b, b.gbps, p.residualGbps, 'bw');
  const objective = ` obj: ${b.objective.length > 0 ? sum(b.objective) : '0 u0'}`;
  const lp = [
    'Minimize', objective, 'Subject To', ...b.rows,
    ...(b.rows.length === 0 ? [' dummy: 0 u0 >= 0'] : []),
    'Bounds', ...b.fixedOut.map((u) => ` ${u} = 1`),
    'Binary', ...chunk(b.binaries), 'End',
  ].join('\n');
  return { lp, weights: w, tieVars: b.tieVars, complete: b.complete, columns: b.binaries.length };
}

function chunk(names: string[]): string[] {
  const lines: string[] = [];
  for (let i = 0; i < names.length; i += 20) lines.push(` ${names.slice(i, i + 20).join(' ')}`);
  return lines;
}
