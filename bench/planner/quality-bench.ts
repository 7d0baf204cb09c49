// (c) DE vs greedy vs exact on the same windows: unresolved, move cost, time, and DE's gap to exact's
// proven optimum (or its bound). Small instances are tiny enough for every simple path, so exact's optimum
// there is the true optimum over the candidate sites; medium ones use k = 4 candidate paths per tie.
import { exactPlan } from '../../planner/exact/exact-plan';
import { weightedObjective } from '../../planner/exact/exact-weights';
import type { Objective } from '../../planner/model/types';
import { compareObjectives } from '../../planner/plan/evaluate-plan';
import { planWindow } from '../../planner/remap/plan-window';
import { buildRemapProblem } from '../../planner/remap/problem';
import { buildInstance, log, type Instance } from './instances';
import { ms, pct, type Row } from './report';

const MAX_CANDIDATES = 8;

interface Tier {
  name: string;
  instances: Instance[];
  exactLimitMs: number;
}

interface Outcome {
  tier: string;
  de: Objective; deMs: number;
  greedy: Objective; greedyMs: number;
  exact: Objective; exactMs: number; optimal: boolean; complete: boolean;
  /** DE's relative gap, weighted objective, to exact's optimum (when proven) or bound */
  gap: number;
}

const levels = (o: Objective): Objective => ({ ...o, peakUtilisation: 0 });

async function runWindow(tier: Tier, inst: Instance, w: Instance['windows'][number]): Promise<Outcome> {
  const base = { maxCandidates: MAX_CANDIDATES, seed: 1 };
  const greedy = await planWindow(inst.inv, w, { ...base, mode: 'greedy' });
  const de = await planWindow(inst.inv, w, { ...base, mode: 'serial' });
  const ex = await exactPlan(buildRemapProblem(inst.inv, w, { maxCandidates: MAX_CANDIDATES }), { timeLimitMs: tier.exactLimitMs });
  const deW = weightedObjective(ex.weights, de.objective);
  const ref = ex.optimal ? ex.weighted : ex.bound;
  return {
    tier: tier.name, de: de.objective, deMs: de.elapsedMs, greedy: greedy.objective, greedyMs: greedy.elapsedMs,
    exact: ex.objective, exactMs: ex.elapsedMs, optimal: ex.optimal, complete: ex.complete,
    gap: deW === ref ? 0 : (deW - ref) / Math.max(Math.abs(ref), 1e-9),
  };
}

function tierRows(name: string, list: Outcome[]): Row[] {
  const sum = (f: (o: Outcome) => number) => list.reduce((s, o) => s + f(o), 0);
  const proven = list.filter((o) => o.optimal).length;
  return [
    { section: '(c)', figure: `${name}: windows; exact proven optimal (all paths listed)`, value: `${list.length}; ${proven} (${list.filter((o) => o.optimal && o.complete).length})` },
    { section: '(c)', figure: `${name}: unresolved DE / greedy / exact`, value: `${sum((o) => o.de.unresolved)} / ${sum((o) => o.greedy.unresolved)} / ${sum((o) => o.exact.unresolved)}` },
    { section: '(c)', figure: `${name}: move cost DE / greedy / exact`, value: `${sum((o) => o.de.moveCost)} / ${sum((o) => o.greedy.moveCost)} / ${sum((o) => o.exact.moveCost)}` },
    { section: '(c)', figure: `${name}: mean time DE / greedy / exact`, value: `${ms(sum((o) => o.deMs) / list.length)} / ${ms(sum((o) => o.greedyMs) / list.length)} / ${ms(sum((o) => o.exactMs) / list.length)}` },
    { section: '(c)', figure: `${name}: DE gap to exact optimum or bound, mean / max`, value: `${pct(sum((o) => o.gap) / list.length)} / ${pct(Math.max(...list.map((o) => o.gap)))}` },
  ];
}

function targetRows(all: Outcome[]): Row[] {
  const small = all.filter((o) => o.tier === 'small' && o.optimal && o.complete);
  const equal = small.filter((o) => compareObjectives(levels(o.de), levels(o.exact)) <= 0);
  const rest = small.filter((o) => !equal.includes(o));
  const medium = all.filter((o) => o.tier === 'medium');
  const timeShare = medium.reduce((s, o) => s + o.deMs, 0) / Math.max(1, medium.reduce((s, o) => s + o.exactMs, 0));
  const notWorse = all.filter((o) => compareObjectives(o.de, o.greedy) <= 0).length;
  // "where they differ": same unresolved weight (like for like), different move cost
  const differ = all.filter((o) => o.de.unresolvedWeight === o.greedy.unresolvedWeight && o.de.moveCost !== o.greedy.moveCost && o.greedy.moveCost > 0);
  const saving = differ.reduce((s, o) => s + (o.greedy.moveCost - o.de.moveCost) / o.greedy.moveCost, 0) / Math.max(1, differ.length);
  const resolvedMore = all.filter((o) => o.de.unresolvedWeight < o.greedy.unresolvedWeight).length;
  const maxRestGap = Math.max(0, ...rest.map((o) => o.gap));
  return [
    { section: '(c)', figure: 'DE equals the proven optimum (small)', value: `${equal.length}/${small.length} = ${pct(equal.length / Math.max(1, small.length))}`, target: '≥ 90 %', met: small.length > 0 ? equal.length >= 0.9 * small.length : null },
    { section: '(c)', figure: 'DE gap on the other small instances, max', value: rest.length ? pct(maxRestGap) : 'none', target: '≤ 2 %', met: small.length > 0 ? maxRestGap <= 0.02 : null },
    { section: '(c)', figure: 'DE time as a share of exact time (medium)', value: pct(timeShare), target: '≤ 10 %', met: medium.length > 0 ? timeShare <= 0.1 : null },
    { section: '(c)', figure: 'DE never worse than greedy (all windows)', value: `${notWorse}/${all.length}`, target: `${all.length}/${all.length}`, met: notWorse === all.length },
    { section: '(c)', figure: 'windows where DE leaves less unresolved than greedy', value: `${resolvedMore}` },
    { section: '(c)', figure: 'DE move cost below greedy where they differ (same unresolved), mean', value: differ.length ? `${pct(saving)} over ${differ.length} windows` : 'no such window', target: '≥ 20 %', met: differ.length > 0 ? saving >= 0.2 : null },
  ];
}

export async function qualityRefs(quick: boolean): Promise<Row[]> {
  const tiers: Tier[] = [
    { name: 'small', exactLimitMs: 60_000, instances: (quick ? [1] : [1, 2, 3, 4]).map((s) => buildInstance(12, 30, 300 + s, 5, 15, MAX_CANDIDATES)) },
    { name: 'medium', exactLimitMs: quick ? 20_000 : 60_000, instances: [buildInstance(50, 500, 350, quick ? 2 : 5, 80, MAX_CANDIDATES)] },
  ];
  if (!quick) tiers.push({ name: 'large', exactLimitMs: 60_000, instances: [buildInstance(200, 2000, 400, 3, 150, MAX_CANDIDATES)] });
  const all: Outcome[] = [];
  const rows: Row[] = [];
  for (const tier of tiers) {
    const list: Outcome[] = [];
    for (const inst of tier.instances) {
      for (const w of inst.windows) {
        log(`(c) ${tier.name} ${inst.label} ${w.id}`);
        list.push(await runWindow(tier, inst, w));
      }
    }
    rows.push(...tierRows(`${tier.name} (${tier.instances[0].label})`, list));
    all.push(...list);
  }
  return [...rows, ...targetRows(all)];
}
