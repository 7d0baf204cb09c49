// Watches a plan run's thread from the hosting process: writes a heartbeat and progress at most twice a second,
// checks the row at least every second (a planner's cancel, another worker taking over) and enforces the job's expiry.
import { setTimeout as delay } from 'node:timers/promises';
import type { Db } from '../../db/client';
import type { PlanProgress } from '../../shared/plans';
import { beat, readRunState } from '../queries/plans/plan-run-rows';
import type { PlanThread, ThreadOutcome } from './plan-thread';

/** WARNING: one tick both throttles progress writes (≤ 2/s) and bounds how late a cancel is seen (≤ 0.5 s + query). */
export const WATCH_TICK_MS = 500;

export type StopReason = 'cancelled' | 'superseded' | 'shutdown' | 'expired';
export type RunEnd = ThreadOutcome | { kind: 'stopped'; reason: StopReason };

/**
 * The latest progress from the thread, written once per tick whatever the thread's pace. While the thread sits
 * in a reference solver it reports nothing (HiGHS runs in one call), so the elapsed time is carried on from
 * this process's clock: the app's figures keep moving and show the run is alive.
 */
export class ProgressBox {
  latest: PlanProgress | null = null;
  private dirty = false;
  private setAtMs = 0;
  constructor(private readonly nowMs: () => number = Date.now) {}
  set(p: PlanProgress): void { this.latest = p; this.dirty = true; this.setAtMs = this.nowMs(); }
  take(): PlanProgress | null {
    if (this.dirty) {
      this.dirty = false;
      return this.latest;
    }
    if (this.latest?.phase !== 'references') return null;
    return { ...this.latest, elapsedMs: this.latest.elapsedMs + (this.nowMs() - this.setAtMs) };
  }
}

export type WatchOptions = {
  db: Db;
  planId: string;
  attempt: number;
  thread: PlanThread;
  progress: ProgressBox;
  /** ms until the queue would expire the job; the thread is stopped just before */
  deadlineMs: number;
  /** called with a function that stops this run (the worker's shutdown uses it) */
  onStopper?: (stop: (reason: StopReason) => void) => void;
};

async function stillOurs(o: WatchOptions): Promise<StopReason | null> {
  if (await beat(o.db, o.planId, o.attempt, o.progress.take())) return null;
  const state = await readRunState(o.db, o.planId);
  if (state?.status === 'running' && state.attempts === o.attempt) return null;
  return state?.status === 'cancelled' ? 'cancelled' : 'superseded';
}

export async function watchRun(o: WatchOptions): Promise<RunEnd> {
  let settled = false;
  let stop: (reason: StopReason) => void = () => undefined;
  const stopped = new Promise<RunEnd>((resolve) => { stop = (reason) => resolve({ kind: 'stopped', reason }); });
  o.onStopper?.(stop);
  const timer = setTimeout(() => stop('expired'), o.deadlineMs);
  const poll = async () => {
    while (!settled) {
      await delay(WATCH_TICK_MS);
      if (settled) return;
      // A failed check (database hiccup) is tried again on the next tick; the final write decides the outcome.
      const reason = await stillOurs(o).catch(() => null);
      if (reason) stop(reason);
    }
  };
  void poll();
  try {
    const end = await Promise.race([o.thread.outcome, stopped]);
    if (end.kind === 'stopped') await o.thread.terminate();
    return end;
  } finally {
    settled = true;
    clearTimeout(timer);
  }
}
