// Works one slot-search job: a slot search (the finder over one element group) or a campaign plan (the finder
// over every group, then the scheduler). Marks the row running with its job id (for the heartbeat sweep,
// slot-sweeper.ts), writes progress (the heartbeat) about every half second, stores the result. A request error
// (AppError: elements gone since, no usable slot) is stored as `failed` at once, since retrying cannot help;
// anything else puts the row back to `queued` and is thrown, so the queue retries it, and a job whose retries are
// used up reaches the dead-letter handler (slot-dead-letter.ts), which marks it failed.
import type { Db } from '../../db/client';
import type { SearchProgress, SlotSearchRequest } from '../../shared/slots';
import { retryWhileDatabaseUnavailable } from '../db-unavailable';
import { AppError } from '../errors';
import {
  beatCampaign, finishCampaignDraft, finishCampaignFailed, markCampaignRunning, requeueCampaign, selectCampaign,
} from '../queries/slots/campaign-rows';
import {
  beatSearch, finishSearchDone, finishSearchFailed, markSearchRunning, requeueSearch, selectSlotSearch,
} from '../queries/slots/search-rows';
import { nameElements } from '../services/campaigns/element-names';
import type { SlotEngine } from '../services/campaigns/engine';
import { planCampaign } from '../services/campaigns/plan-campaign';
import type { CampaignRequest } from '../services/campaigns/stored-schedule';
import type { SlotSearchJob } from '../services/ports';

export type SlotJobDeps = {
  db: Db;
  engine: SlotEngine;
  log: (line: string) => void;
  /** the searches' "now" (lead times count from it); default the clock */
  now?: () => Date;
  /** at most one progress write per this many milliseconds (default 500) */
  progressEveryMs?: number;
  /** set by the worker's stop(): the search gives up and goes back to the queue */
  stopping?: { readonly aborted: boolean };
};
export type SlotJob = { id: string; data: SlotSearchJob };

const PROGRESS_EVERY_MS = 500;

/** The row operations one kind of job needs, so both kinds share the handler's steps. */
type RowOps = {
  label: string;
  beat: (attempt: number, p: SearchProgress) => Promise<boolean>;
  failed: (attempt: number, error: string, now: Date) => Promise<boolean>;
  requeue: (attempt: number) => Promise<void>;
};

/**
 * Progress goes to the row at most every `everyMs` (the first at once); a write that finds the row no longer
 * this attempt's (the job expired and another worker took it) aborts the search.
 */
function progressWriter(ops: RowOps, attempt: number, everyMs: number, stopping?: { readonly aborted: boolean }) {
  let lastMs = -Infinity;
  let lost = false;
  const signal = { get aborted() { return lost || (stopping?.aborted ?? false); } };
  const write = async (p: SearchProgress) => {
    const nowMs = Date.now();
    if (nowMs - lastMs < everyMs) return;
    lastMs = nowMs;
    if (!(await ops.beat(attempt, p))) lost = true;
  };
  return { signal, write };
}

function closingWrite<T>(deps: SlotJobDeps, label: string, write: () => Promise<T>): Promise<T> {
  return retryWhileDatabaseUnavailable(write, {
    onWait: (_err, waitedMs) => { if (waitedMs === 0) deps.log(`${label}: the database is unavailable; storing the outcome when it is back`); },
  });
}

const firstProgress = (total: number): SearchProgress => ({ phase: 'preparing', done: 0, total, elapsedMs: 0 });

/**
 * Runs `work`; its failure is stored (request errors) or handed back to the queue (anything else, and a search
 * stopped by the worker's shutdown or taken over by another attempt: the guarded requeue leaves a newer one be).
 */
async function guarded(
  deps: SlotJobDeps, ops: RowOps, attempt: number, signal: { readonly aborted: boolean }, work: () => Promise<void>,
): Promise<void> {
  const startMs = Date.now();
  try {
    await work();
    deps.log(`${ops.label}: done in ${Date.now() - startMs} ms (attempt ${attempt})`);
  } catch (err) {
    const message = err instanceof Error ? err.message : String(err);
    if (err instanceof AppError && !signal.aborted) {
      await closingWrite(deps, ops.label, () => ops.failed(attempt, message, new Date()));
      deps.log(`${ops.label}: failed (${message})`);
      return;
    }
    await closingWrite(deps, ops.label, () => ops.requeue(attempt));
    deps.log(`${ops.label}: retry (${message})`);
    throw err instanceof Error ? err : new Error(message);
  }
}

export async function runSlotJob(deps: SlotJobDeps, job: SlotJob): Promise<void> {
  if (job.data.kind === 'campaign') return runCampaign(deps, job.data.id, job.id);
  return runSearch(deps, job.data.id, job.id);
}

async function runSearch(deps: SlotJobDeps, id: string, jobId: string): Promise<void> {
  const { db } = deps;
  const row = await selectSlotSearch(db, id);
  if (!row || (row.status !== 'queued' && row.status !== 'running')) return;
  const attempt = await markSearchRunning(db, id, new Date(), firstProgress(0), jobId);
  if (attempt === null) return;
  const ops: RowOps = {
    label: `slot search ${id}`,
    beat: (a, p) => beatSearch(db, id, a, p),
    failed: (a, error, now) => finishSearchFailed(db, id, a, error, now),
    requeue: (a) => requeueSearch(db, id, a),
  };
  const progress = progressWriter(ops, attempt, deps.progressEveryMs ?? PROGRESS_EVERY_MS, deps.stopping);
  await guarded(deps, ops, attempt, progress.signal, async () => {
    const request = row.request as SlotSearchRequest;
    const startMs = Date.now();
    const found = await deps.engine.findSlots(db, request, {
      now: deps.now?.() ?? new Date(), onProgress: progress.write, signal: progress.signal,
    });
    if (progress.signal.aborted) throw new Error('the search was stopped before it finished');
    const [elements] = await nameElements(db, [request]);
    const total = found.candidates.length;
    const finished = { phase: 'finishing' as const, done: total, total, elapsedMs: Date.now() - startMs };
    await closingWrite(deps, ops.label, () => finishSearchDone(db, id, attempt, {
      result: { candidates: found.candidates, summary: found.summary, elements }, progress: finished, now: new Date(),
    }));
  });
}

async function runCampaign(deps: SlotJobDeps, id: string, jobId: string): Promise<void> {
  const { db } = deps;
  const row = await selectCampaign(db, id);
  if (!row || (row.status !== 'queued' && row.status !== 'running')) return;
  const request = row.request as CampaignRequest;
  const attempt = await markCampaignRunning(db, id, new Date(), firstProgress(request.groups.length), jobId);
  if (attempt === null) return;
  const ops: RowOps = {
    label: `campaign ${id}`,
    beat: (a, p) => beatCampaign(db, id, a, p),
    failed: (a, error, now) => finishCampaignFailed(db, id, a, error, now),
    requeue: (a) => requeueCampaign(db, id, a),
  };
  const progress = progressWriter(ops, attempt, deps.progressEveryMs ?? PROGRESS_EVERY_MS, deps.stopping);
  await guarded(deps, ops, attempt, progress.signal, async () => {
    const startMs = Date.now();
    const schedule = await planCampaign({
      db, engine: deps.engine, now: deps.now?.() ?? new Date(), onProgress: progress.write, signal: progress.signal,
    }, request);
    if (progress.signal.aborted) throw new Error('the planning was stopped before it finished');
    const total = request.groups.length;
    const finished = { phase: 'finishing' as const, done: total, total, elapsedMs: Date.now() - startMs };
    await closingWrite(deps, ops.label, () => finishCampaignDraft(db, id, attempt, { schedule, progress: finished, now: new Date() }));
  });
}
