// (e) islands vs serial on real-shape windows, 2 workers: how long each mode takes to reach the objective the
// serial search ends with. Both record best-so-far over time from planWindow's onProgress (serial reports every
// generation, islands every migration); serial's trace is the one its (e) run recorded, same settings and seed.
// The target is serial's last reported best — the DE's own result before the final hill-climb, which onProgress
// does not report — so both modes are judged on the same kind of trace. A window where serial's DE never
// improves on its first report (its seeds) has nothing to race for and is left out.
import { compareObjectives } from '../../planner/plan/evaluate-plan';
import { PLAN_DEFAULTS, planWindow } from '../../planner/remap/plan-window';
import { createParallelRunner, type WorkerParallelRunner } from '../../planner/workers/parallel-runner';
import { log, type RealShapeInstance } from './instances';
import { MAX_CANDIDATES, type ProgressPoint, type ShapeOutcome } from './real-shape-run';
import { ms, pct, type Row } from './report';

const SECTION = '(e)';
const WORKERS = 2;

export interface RaceEntry {
  inst: RealShapeInstance;
  outcome: ShapeOutcome;
}

const firstReach = (trace: ProgressPoint[], target: ProgressPoint['best']) => trace.find((p) => compareObjectives(p.best, target) <= 0)?.ms ?? Infinity;
const improves = (trace: ProgressPoint[]) => trace.length > 1 && compareObjectives(trace[trace.length - 1].best, trace[0].best) < 0;
const describe = (o: ProgressPoint['best']) => `unres ${o.unresolved} (w ${o.unresolvedWeight}), cost ${o.moveCost}, usage ${o.usage.toFixed(1)}`;

async function islandsTrace(e: RaceEntry, runner: WorkerParallelRunner): Promise<{ trace: ProgressPoint[]; totalMs: number }> {
  const trace: ProgressPoint[] = [];
  // As the serial run: planner defaults (30 s limit, stall stop, population 40 in total), touched slices only.
  const r = await planWindow(e.inst.inv, e.inst.windows[0], {
    mode: 'islands', seed: 1, knockOn: false, maxCandidates: MAX_CANDIDATES, workers: WORKERS, parallel: runner, scenario: e.inst.scenario,
    onProgress: (p) => trace.push({ ms: p.elapsedMs, best: p.best }),
  });
  return { trace, totalMs: r.elapsedMs };
}

const serialToFinal = (e: RaceEntry) => {
  const trace = e.outcome.deTrace;
  return firstReach(trace, trace[trace.length - 1].best);
};

/**
 * Races the `count` windows where serial's DE took longest to reach its final objective (and improved on its
 * seeds on the way): where the search has work to do, which is where threads can pay off.
 */
export async function islandsVsSerial(entries: RaceEntry[], count: number): Promise<Row[]> {
  const eligible = entries.filter((e) => improves(e.outcome.deTrace))
    .sort((a, b) => serialToFinal(b) - serialToFinal(a) || a.inst.label.localeCompare(b.inst.label)).slice(0, count);
  const figure = `islands (${WORKERS} workers) time to reach serial's final DE objective, as a share of serial's (pop ${PLAN_DEFAULTS.population})`;
  if (eligible.length === 0) {
    return [{ section: SECTION, figure, value: `no window where serial's DE improved on its seeds (of ${entries.length})`, target: '≤ 50 % each', met: null }];
  }
  const runner = createParallelRunner();
  const rows: Row[] = [];
  const shares: { label: string; share: number }[] = [];
  try {
    // Warm the pool (threads start and compile once per process, as in a long-lived job worker).
    await planWindow(eligible[0].inst.inv, eligible[0].inst.windows[0], {
      mode: 'islands', generations: 1, knockOn: false, workers: WORKERS, parallel: runner, scenario: eligible[0].inst.scenario,
    });
    for (const e of eligible) {
      log(`(e) islands vs serial ${e.inst.label}`);
      const serial = e.outcome.deTrace;
      const target = serial[serial.length - 1].best;
      const serialMs = firstReach(serial, target);
      const islands = await islandsTrace(e, runner);
      const islandsMs = firstReach(islands.trace, target);
      shares.push({ label: e.inst.label, share: islandsMs / serialMs });
      rows.push({
        section: SECTION, figure: `${e.inst.label} islands vs serial, time to serial's final DE objective (${describe(target)})`,
        value: `serial ${ms(serialMs)} (run ${ms(e.outcome.deMs)}), islands ${Number.isFinite(islandsMs) ? ms(islandsMs) : 'never'} (run ${ms(islands.totalMs)})`,
      });
    }
  } finally {
    await runner.close();
  }
  const over = shares.filter((s) => s.share > 0.5);
  const worst = Math.max(...shares.map((s) => s.share));
  rows.push({
    section: SECTION, figure,
    value: `worst ${Number.isFinite(worst) ? pct(worst) : 'never reached'} over ${shares.length} windows${over.length ? `; missed: ${over.map((s) => s.label).join(', ')}` : ''}`,
    target: '≤ 50 % each', met: over.length === 0,
  });
  return rows;
}
