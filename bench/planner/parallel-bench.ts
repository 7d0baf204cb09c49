// (b) serial vs islands vs shared-eval: wall time and objective with 2 workers, same total population and
// generations (islands split the population between them), stall and time limits off so work is equal.
// Objectives are the search's own (`result.search`), before any greedy fallback.
import type { Objective } from '../../planner/model/types';
import { compareObjectives } from '../../planner/plan/evaluate-plan';
import { planWindow } from '../../planner/remap/plan-window';
import { createParallelRunner } from '../../planner/workers/parallel-runner';
import { buildInstance, log } from './instances';
import { ms, type Row } from './report';

const MODES = ['serial', 'islands', 'shared-eval'] as const;

function describe(o: Objective): string {
  return `unres ${o.unresolved} (w ${o.unresolvedWeight}), cost ${o.moveCost}, usage ${o.usage.toFixed(1)}`;
}

export async function parallelModes(quick: boolean): Promise<Row[]> {
  const inst = buildInstance(200, 2000, 202, quick ? 1 : 3, 120);
  log(`(b) ${inst.label}, ${inst.windows.length} window(s)`);
  const runner = createParallelRunner();
  const de = {
    population: 40, generations: quick ? 60 : 150, stallGenerations: 1_000_000, timeLimitMs: 600_000, workers: 2,
    migrationInterval: 10, scenario: inst.scenario, parallel: runner,
  };
  const rows: Row[] = [];
  try {
    // Warm the pool (threads start and compile once per process, as in a long-lived job worker).
    await planWindow(inst.inv, inst.windows[0], { ...de, mode: 'shared-eval', generations: 1 });
    const total = { serial: 0, islands: 0, 'shared-eval': 0 };
    let islandsNotWorse = 0;
    for (const w of inst.windows) {
      const out: Partial<Record<(typeof MODES)[number], { ms: number; objective: Objective; affected: number }>> = {};
      for (const mode of MODES) {
        const r = await planWindow(inst.inv, w, { ...de, mode, seed: 11 });
        const objective = r.search?.objective ?? r.objective;
        out[mode] = { ms: r.elapsedMs, objective, affected: r.affected.length };
        total[mode] += r.elapsedMs;
        rows.push({ section: '(b)', figure: `${w.id} (${r.affected.length} affected) ${mode}`, value: `${ms(r.elapsedMs)}; ${describe(objective)}` });
      }
      if (compareObjectives(out.islands!.objective, out.serial!.objective) <= 0) islandsNotWorse += 1;
    }
    const n = inst.windows.length;
    const islandsSpeedup = total.serial / total.islands;
    rows.push(
      { section: '(b)', figure: `islands speed-up over serial (${inst.label}, pop 40, ${de.generations} gen)`, value: `${islandsSpeedup.toFixed(2)}×`, target: '≥ 1.6×', met: islandsSpeedup >= 1.6 },
      { section: '(b)', figure: 'islands objective equal or better than serial', value: `${islandsNotWorse}/${n}`, target: `${n}/${n}`, met: islandsNotWorse === n },
      { section: '(b)', figure: 'shared-eval speed-up over serial (same search as serial)', value: `${(total.serial / total['shared-eval']).toFixed(2)}×` },
    );
  } finally {
    await runner.close();
  }
  return rows;
}
