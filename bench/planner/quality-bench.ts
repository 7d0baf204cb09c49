// (c) DE vs greedy vs exact on the same windows: unresolved, move cost, time, and DE's gap to exact's
// proven optimum (or its bound). Small instances are tiny enough for every simple path, so exact's optimum
// there is the true optimum over the candidate sites; medium ones use k = 4 candidate paths per tie.
// The small tier is tight: real-shape scenarios (scenarios/generate/real-shape-scenario.ts) whose capacity is
// scarce around their window. DE figures are the search's own (`result.search`), before any greedy fallback,
// with touched slices only (no knock-on moves), the same problem exact solves.
import { exactPlanWindow } from '../../planner/exact/exact-plan';
import { weightedObjective } from '../../planner/exact/exact-weights';
import type { Objective } from '../../planner/model/types';
import { computePlan } from '../../planner/plan/compute-plan';
import { compareObjectives } from '../../planner/plan/evaluate-plan';
import { buildInstance, buildRealShapeInstance, log, type Instance, type RealShapeInstance } from './instances';
import { ms, pct, type Row } from './report';

const MAX_CANDIDATES = 8;

interface Tier {
  name: string;
  label: string;
  instances: (Instance | RealShapeInstance)[];
  exactLimitMs: number;
}

interface Outcome {
  tier: string;
  /** instance label and window id */
  label: string;
  affected: number;
  /** real-shape instances: peak span utilisation with the window down on obvious detours */
  peakUtilisation?: number;
  de: Objective; deMs: number;
  greedy: Objective; greedyMs: number;
  exact: Objective; exactMs: number; optimal: boolean; complete: boolean;
  /** DE's relative gap, weighted objective, to exact's optimum (when proven) or bound */
  gap: number;
}

const levels = (o: Objective): Objective => ({ ...o, peakUtilisation: 0 });

async function runWindow(tier: Tier, inst: Instance, w: Instance['windows'][number]): Promise<Outcome> {
  const plan = { maxCandidates: MAX_CANDIDATES, seed: 1, mode: 'serial' as const, knockOn: false };
  const { result: run, greedy } = await computePlan(inst.scenario, w, { inventory: inst.inv, plan, references: { greedy: true } });
  if (!run.search) throw new Error(`planWindow gave no search figures for ${inst.label} ${w.id}`);
  if (!greedy?.objective) throw new Error(`greedy gave no plan for ${inst.label} ${w.id}: ${greedy?.note}`);
  const de = run.search.objective;
  const ex = await exactPlanWindow(inst.inv, w, { timeLimitMs: tier.exactLimitMs, problem: { maxCandidates: MAX_CANDIDATES } });
  const deW = weightedObjective(ex.weights, de);
  const ref = ex.optimal ? ex.weighted : ex.bound;
  return {
    tier: tier.name, label: `${inst.label} ${w.id}`, affected: run.affected.length,
    peakUtilisation: (inst as Partial<RealShapeInstance>).peakUtilisation,
    de, deMs: run.elapsedMs, greedy: greedy.objective, greedyMs: greedy.elapsedMs,
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

const cost = (x: number) => (Number.isInteger(x) ? String(x) : x.toFixed(2));

/** Per-window line of the small tight tier. */
function windowRow(o: Outcome): Row {
  const peak = o.peakUtilisation === undefined ? '' : `, peak ${(100 * o.peakUtilisation).toFixed(0)} %`;
  return {
    section: '(c)', figure: `small tight ${o.label}`,
    value: `${o.affected} affected${peak}; unresolved DE ${o.de.unresolved} / greedy ${o.greedy.unresolved} / exact ${o.exact.unresolved}${o.optimal ? '*' : ''}; `
      + `move cost DE ${cost(o.de.moveCost)} / greedy ${cost(o.greedy.moveCost)} / exact ${cost(o.exact.moveCost)}; time DE ${ms(o.deMs)} / exact ${ms(o.exactMs)}`,
  };
}

/** Small tight windows: DE alone leaves no more unresolved than the proven optimum (every path listed). */
function smallTightRow(all: Outcome[]): Row {
  const small = all.filter((o) => o.tier === 'small' && o.optimal && o.complete);
  const hit = small.filter((o) => o.de.unresolved <= o.exact.unresolved);
  const missed = small.filter((o) => !hit.includes(o)).map((o) => o.label);
  return {
    section: '(c)', figure: 'small tight windows: DE alone leaves the proven optimum\'s unresolved count',
    value: `${hit.length}/${small.length} = ${pct(hit.length / Math.max(1, small.length))}${missed.length ? `; missed: ${missed.join(', ')}` : ''}`,
    target: '≥ 95 %', met: small.length > 0 ? hit.length >= 0.95 * small.length : null,
  };
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
    smallTightRow(all),
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
    // One tight window per real-shape seed (a site and two spans down, shortest detours at ≥ 80 % peak).
    { name: 'small', label: 'small tight (12 sites / 30 slices, real shape)', exactLimitMs: 60_000,
      instances: Array.from({ length: quick ? 5 : 20 }, (_, i) => buildRealShapeInstance(12, 30, 501 + i)) },
    { name: 'medium', label: 'medium (50 sites / 500 slices)', exactLimitMs: quick ? 20_000 : 60_000, instances: [buildInstance(50, 500, 350, quick ? 2 : 5, 80, MAX_CANDIDATES)] },
  ];
  if (!quick) tiers.push({ name: 'large', label: 'large (200 sites / 2000 slices)', exactLimitMs: 60_000, instances: [buildInstance(200, 2000, 400, 3, 150, MAX_CANDIDATES)] });
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
    if (tier.name === 'small') rows.push(...list.map(windowRow));
    rows.push(...tierRows(tier.label, list));
    all.push(...list);
  }
  return [...rows, ...targetRows(all)];
}
