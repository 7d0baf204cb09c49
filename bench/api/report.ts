// The bench's one table: figure | measured | target | met, with units, under a line naming the sizes seeded.
import type { LoadResult, ExportTiming, RouteTiming } from './measure';
import type { PlanFigures } from './plan-run';

export type Row = { figure: string; measured: string; target: string; met: boolean | null };

export const ROUTE_P95_TARGET_MS = 150;
export const ASSESS_P95_TARGET_MS = 1000;
const LOAD_TARGET = { perSecond: 100, p99Ms: 500 };
const PLAN_TARGET = { generations: 50, overLimitMs: 2000 };
const RSS_SERVING_TARGET_BYTES = 500 * 1024 ** 2;
const FIRST_BYTE_TARGET_MS = 1000;

const ms = (value: number) => (Number.isFinite(value) ? `${Math.round(value).toLocaleString('en-GB')} ms` : '—');
const mb = (bytes: number | null) => (bytes === null ? '—' : `${Math.round(bytes / 1024 ** 2).toLocaleString('en-GB')} MB`);
const count = (n: number) => n.toLocaleString('en-GB');

export function routeRow(t: RouteTiming, targetMs: number | null): Row {
  const figure = `${t.route.label}, p50 / p95 (${t.samples.length} sequential)`;
  const target = targetMs === null ? '—' : `p95 ≤ ${count(targetMs)} ms`;
  if (t.failure !== null) return { figure, measured: `failed: ${t.failure}`, target, met: targetMs === null ? null : false };
  return { figure, measured: `${ms(t.p50)} / ${ms(t.p95)}`, target, met: targetMs === null ? null : t.p95 <= targetMs };
}

export function loadRows(load: LoadResult, clients: number): Row[] {
  const label = `${clients} concurrent for ${Math.round(load.seconds)} s on lists + impact`;
  return [
    { figure: `${label}: requests/s`, measured: `${load.perSecond.toFixed(1)} /s (${count(load.requests)} requests)`,
      target: `≥ ${LOAD_TARGET.perSecond} /s`, met: load.perSecond >= LOAD_TARGET.perSecond },
    { figure: `${label}: p50 / p99`, measured: `${ms(load.p50)} / ${ms(load.p99)}`,
      target: `p99 ≤ ${LOAD_TARGET.p99Ms} ms`, met: load.p99 <= LOAD_TARGET.p99Ms },
    { figure: `${label}: errors`, measured: count(load.errors), target: 'none', met: load.errors === 0 },
  ];
}

export function exportRows(scenario: ExportTiming, graphml: ExportTiming, runs: number): Row[] {
  const size = (t: ExportTiming) => (t.bytes < 1024 ** 2 ? `${Math.round(t.bytes / 1024)} KB` : `${(t.bytes / 1024 ** 2).toFixed(1)} MB`);
  return [
    { figure: `scenario export, first byte / total (median of ${runs}, ${size(scenario)})`,
      measured: `${ms(scenario.firstByteMs)} / ${ms(scenario.totalMs)}${scenario.streamed ? ', streamed' : ', not streamed'}`,
      target: `first byte ≤ ${count(FIRST_BYTE_TARGET_MS)} ms, streamed`,
      met: scenario.firstByteMs <= FIRST_BYTE_TARGET_MS && scenario.streamed },
    { figure: `GraphML export, first byte / total (median of ${runs}, ${size(graphml)})`,
      measured: `${ms(graphml.firstByteMs)} / ${ms(graphml.totalMs)}${graphml.streamed ? ', streamed' : ', not streamed'}`,
      target: '—', met: null },
  ];
}

const versus = (c: number | null) => (c === null ? '' : c < 0 ? ' (search better)' : c > 0 ? ' (greedy better)' : ' (equal)');

/** Better on the lexicographic objective; a tie counts only when greedy already resolves every slice. */
function beatsGreedy(plan: PlanFigures): boolean | null {
  if (plan.versusGreedy === null) return null;
  return plan.versusGreedy < 0 || (plan.versusGreedy === 0 && plan.greedyUnresolved === 0);
}

export function planRows(plan: PlanFigures, siteName: string): Row[] {
  const rows: Row[] = [
    { figure: `plan window (${siteName} down): slices touched, default settings`, measured: `${count(plan.touched)}, run ${plan.status}${plan.error ? `: ${plan.error}` : ''}`,
      target: '~1,300 at 20,000 slices', met: null },
    { figure: 'plan window: generations (evaluations)', measured: `${count(plan.generations)} (${count(plan.evaluations)})`,
      target: `≥ ${PLAN_TARGET.generations}`, met: plan.generations >= PLAN_TARGET.generations },
    { figure: 'plan window: unresolved slices, search / greedy',
      measured: `${plan.searchUnresolved ?? '—'} / ${plan.greedyUnresolved ?? '—'}${versus(plan.versusGreedy)}`,
      target: 'search better than greedy', met: beatsGreedy(plan) },
  ];
  const total = plan.totalMs ?? NaN;
  rows.push({ figure: `plan window: total time, limit ${count(plan.limitMs / 1000)} s (started → finished; as the client saw it)`,
    measured: `${ms(total)}; ${ms(plan.seenMs)}`,
    target: `≤ limit + ${PLAN_TARGET.overLimitMs / 1000} s`, met: Number.isFinite(total) ? total <= plan.limitMs + PLAN_TARGET.overLimitMs : false });
  rows.push({ figure: 'slowest progress poll while planning', measured: ms(plan.slowestPollMs), target: '—', met: null });
  return rows;
}

export function rssRows(serving: number | null, planning: number | null): Row[] {
  return [
    { figure: 'server RSS while serving (max, sampled every 250 ms)', measured: mb(serving),
      target: `≤ ${mb(RSS_SERVING_TARGET_BYTES)}`, met: serving === null ? null : serving <= RSS_SERVING_TARGET_BYTES },
    { figure: 'server RSS while planning (max)', measured: mb(planning), target: '—', met: null },
  ];
}

export function printTable(title: string, rows: Row[]): void {
  const met = (m: boolean | null) => (m === null ? '—' : m ? 'yes' : 'no');
  const header: Row = { figure: 'figure', measured: 'measured', target: 'target', met: null };
  const widths = {
    figure: Math.max(...[header, ...rows].map((r) => r.figure.length)),
    measured: Math.max(...[header, ...rows].map((r) => r.measured.length)),
    target: Math.max(...[header, ...rows].map((r) => r.target.length)),
  };
  const line = (r: Row, m: string) => `| ${r.figure.padEnd(widths.figure)} | ${r.measured.padEnd(widths.measured)} | ${r.target.padEnd(widths.target)} | ${m.padEnd(3)} |`;
  console.log(title);
  console.log(line(header, 'met'));
  console.log(`|${'-'.repeat(widths.figure + 2)}|${'-'.repeat(widths.measured + 2)}|${'-'.repeat(widths.target + 2)}|-----|`);
  for (const r of rows) console.log(line(r, met(r.met)));
}
