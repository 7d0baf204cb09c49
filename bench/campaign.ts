// `npm run bench:campaign [-- --iterations=<n>] [-- --seed=<n>]`: the campaign scheduler on rollout-sized problems —
// 40 element groups, 21 nights, 2 starts a night, random touched slices and clashes, and once the largest campaign
// the form allows (100 groups, 92 nights, a start every 15 minutes) — printing the constructive start, the local
// search's result, the gain, steps applied and wall time; then 8 small campaigns (8 groups, 6 nights) against the
// exhaustive enumeration (planner/campaign/brute-force.ts) to show the search's gap to the proven optimum.
import { performance } from 'node:perf_hooks';
import { bruteForceCampaign } from '../planner/campaign/brute-force';
import { scheduleCampaign, SCHEDULE_DEFAULTS, UNSCHEDULED_PENALTY, type CampaignProblem } from '../planner/campaign/schedule-campaign';
import { createRng, randomInt, type Rng } from '../planner/random/rng';
import { ms, pct, printTable, type Row } from './planner/report';

const HOUR_MS = 3_600_000;
/** The two starts of each night, hours after the night's 00:00 UTC (22:00 and 00:30 the next morning). */
const STARTS_HOURS = [22, 24.5];
/** The largest campaign the form allows: 100 groups, 92 nights, starts every 15 minutes from 20:00 to 03:45. */
const EVERY_QUARTER_HOUR = Array.from({ length: 32 }, (_, k) => 20 + k / 4);
const DURATION_HOURS = 3;
/** Share of starts the slot finder would have kept (the rest excluded: freezes, conflicts, lead time). */
const USABLE_SHARE = 0.85;

interface Shape { starts?: number[]; groups: number; nights: number; slicePool: number; touched: [number, number]; clashes: number; maxPerNight: number; days: number }

const BIG: Shape[] = [
  { groups: 40, nights: 21, slicePool: 400, touched: [1, 4], clashes: 10, maxPerNight: 3, days: 7 },
  { groups: 40, nights: 21, slicePool: 60, touched: [2, 6], clashes: 15, maxPerNight: 3, days: 7 },
  { groups: 40, nights: 21, slicePool: 60, touched: [2, 6], clashes: 15, maxPerNight: 2, days: 7 },
  { groups: 40, nights: 21, slicePool: 40, touched: [3, 8], clashes: 30, maxPerNight: 4, days: 10 },
  { starts: EVERY_QUARTER_HOUR, groups: 100, nights: 92, slicePool: 150, touched: [2, 6], clashes: 250, maxPerNight: 2, days: 10 },
];
const SMALL: Shape = { groups: 8, nights: 6, slicePool: 6, touched: [1, 3], clashes: 3, maxPerNight: 2, days: 2 };

function nightKey(i: number): string {
  return new Date(Date.UTC(2026, 11, 1 + i)).toISOString().slice(0, 10);
}

function randomProblem(shape: Shape, rng: Rng): CampaignProblem {
  const pool = Array.from({ length: shape.slicePool }, (_, i) => `slice-${i}`);
  const groups = Array.from({ length: shape.groups }, () => {
    const base = randomInt(rng, 80);
    const slots = Array.from({ length: shape.nights }, (_, n) => (shape.starts ?? STARTS_HOURS).map((h) => {
      const startMs = Date.UTC(2026, 11, 1 + n) + h * HOUR_MS;
      return { startMs, endMs: startMs + DURATION_HOURS * HOUR_MS, night: nightKey(n), cost: base + randomInt(rng, 120) };
    })).flat().filter(() => rng() < USABLE_SHARE);
    const count = shape.touched[0] + randomInt(rng, shape.touched[1] - shape.touched[0] + 1);
    const touched = [...new Set(Array.from({ length: count }, () => pool[randomInt(rng, pool.length)]))];
    return { slots, touched };
  });
  const clashes = new Map<string, [number, number]>();
  while (clashes.size < Math.min(shape.clashes, (shape.groups * (shape.groups - 1)) / 2)) {
    const i = randomInt(rng, shape.groups);
    const j = randomInt(rng, shape.groups);
    if (i !== j) clashes.set(`${Math.min(i, j)}:${Math.max(i, j)}`, [Math.min(i, j), Math.max(i, j)]);
  }
  return { groups, rules: { maxPerNight: shape.maxPerNight, minDaysBetweenTouches: shape.days }, clashes: [...clashes.values()] };
}

function parseArgs(argv: string[]): { iterations: number; seed: number } {
  const args = { iterations: SCHEDULE_DEFAULTS.maxIterations, seed: 1 };
  for (const a of argv) {
    const [key, value] = a.replace(/^--/, '').split('=');
    const n = Number(value);
    if (!(key in args)) throw new Error(`unknown argument "${a}" (expected --iterations=<n>, --seed=<n>)`);
    if (!Number.isInteger(n) || n < 0) throw new Error(`"${a}" needs a whole number`);
    args[key as keyof typeof args] = n;
  }
  return args;
}

/** No schedule beats every group on its cheapest slot (a group without slots pays the penalty). */
function lowerBound(p: CampaignProblem): number {
  return p.groups.reduce((sum, g) => sum + Math.min(UNSCHEDULED_PENALTY, ...g.slots.map((s) => s.cost)), 0);
}

const points = (x: number) => `${x.toFixed(0)} points`;

function gainWords(moreScheduled: number, cheaper: number): string {
  const windows = cheaper >= 0 ? `windows ${points(cheaper)} cheaper` : `windows ${points(-cheaper)} more in all, the added ones included`;
  return `${moreScheduled} more groups scheduled; ${windows}`;
}

function bigRows(iterations: number, seed: number): Row[] {
  return BIG.flatMap((shape, k) => {
    const p = randomProblem(shape, createRng(seed * 1000 + k));
    const t0 = performance.now();
    const r = scheduleCampaign(p, { seed, maxIterations: iterations });
    const wallMs = performance.now() - t0;
    const section = `${shape.groups} groups × ${shape.nights} nights × ${(shape.starts ?? STARTS_HOURS).length} starts, ≤ ${shape.maxPerNight} a night, ${shape.days} days apart`;
    const outcome = (objective: number) => {
      // bench costs are never negative, so the objective splits into penalties and windows' points
      const unscheduled = Math.floor(objective / UNSCHEDULED_PENALTY);
      return `${shape.groups - unscheduled} of ${shape.groups} groups scheduled, ${points(objective - unscheduled * UNSCHEDULED_PENALTY)}`;
    };
    const startUnscheduled = Math.floor(r.startCost / UNSCHEDULED_PENALTY);
    const endUnscheduled = Math.floor(r.totalCost / UNSCHEDULED_PENALTY);
    return [
      { section, figure: 'constructive start', value: outcome(r.startCost) },
      { section: '', figure: 'after local search', value: outcome(r.totalCost) },
      { section: '', figure: 'lower bound (each group on its cheapest slot)', value: points(lowerBound(p)) },
      { section: '', figure: 'gain', value: gainWords(startUnscheduled - endUnscheduled,
        (r.startCost - startUnscheduled * UNSCHEDULED_PENALTY) - (r.totalCost - endUnscheduled * UNSCHEDULED_PENALTY)) },
      { section: '', figure: 'steps applied / candidates evaluated', value: `${r.moves} / ${r.iterations}` },
      { section: '', figure: 'wall time', value: ms(wallMs), target: '≤ 2,000 ms', met: wallMs <= 2000 },
    ];
  });
}

function smallRows(iterations: number, seed: number): Row[] {
  const gaps: number[] = [];
  const rows: Row[] = [];
  for (let k = 0; k < 8; k++) {
    const p = randomProblem({ ...SMALL, maxPerNight: 1 + (k % 2), days: k % 4 }, createRng(seed * 7919 + k));
    const exact = bruteForceCampaign(p);
    const r = scheduleCampaign(p, { seed, maxIterations: iterations });
    const gap = (r.totalCost - exact.cost) / exact.cost;
    gaps.push(gap);
    rows.push({ section: k === 0 ? `small: ${SMALL.groups} groups × ${SMALL.nights} nights` : '', figure: `instance ${k + 1}`,
      value: `search ${points(r.totalCost)}, exact ${points(exact.cost)}, start ${points(r.startCost)}; gap ${pct(gap)}` });
    // (objectives here include UNSCHEDULED_PENALTY per unscheduled group)
  }
  const worst = Math.max(...gaps);
  rows.push({ section: '', figure: 'largest gap to the optimum', value: pct(worst), target: '0.0 %', met: worst <= 0 });
  return rows;
}

function main(): void {
  const { iterations, seed } = parseArgs(process.argv.slice(2));
  process.stdout.write(`Campaign scheduler, ${iterations} candidates at most, seed ${seed}\n\n`);
  process.stdout.write(`${printTable([...bigRows(iterations, seed), ...smallRows(iterations, seed)])}\n`);
}

main();
