// The progress a run's watcher writes: only new figures while the search reports, and a moving clock while
// the thread sits in a reference solver that reports nothing.
import { ProgressBox } from '../../../server/jobs/plan-run-watch';
import type { PlanProgress } from '../../../shared/plans';

const progress = (phase: PlanProgress['phase'], elapsedMs: number): PlanProgress =>
  ({ phase, generation: 12, evaluations: 480, best: null, elapsedMs, timeLimitMs: 10_000 });

test('during the search, a figure is written once and nothing until the thread reports again', () => {
  let now = 1_000;
  const box = new ProgressBox(() => now);
  expect(box.take()).toBeNull();
  box.set(progress('searching', 300));
  expect(box.take()?.elapsedMs).toBe(300);
  now += 500;
  expect(box.take()).toBeNull();
});

test('in the references phase the elapsed time carries on from the last report', () => {
  let now = 1_000;
  const box = new ProgressBox(() => now);
  box.set(progress('references', 2_000));
  expect(box.take()?.elapsedMs).toBe(2_000);
  now += 1_500;
  expect(box.take()).toMatchObject({ phase: 'references', elapsedMs: 3_500, generation: 12 });
  now += 500;
  expect(box.take()?.elapsedMs).toBe(4_000);
});
