// Slot searches: a checked request is stored `queued` and handed to the slot-search worker; reading one gives its
// state, progress and, once done, the ranked candidates (shared/slots.ts slotSearchSchema).
import { randomBytes } from 'node:crypto';
import type { Db } from '../../../db/client';
import type { Me } from '../../../shared/api';
import type { WaitingJobLimits } from '../../../shared/job-limits';
import { slotSearchSchema, type SlotSearch, type SlotSearchRequest } from '../../../shared/slots';
import { insertSlotSearch, selectSlotSearch } from '../../queries/slots/search-rows';
import { checkWaitingJobs } from '../job-limits/check-waiting-jobs';
import type { SlotSearchQueue } from '../ports';
import { nameElements } from './element-names';
import type { SlotEngine } from './engine';
import { enqueueSlotJob } from './enqueue';
import { SlotSearchNotFoundError } from './errors';

export const newSlotSearchId = () => `ss-${randomBytes(9).toString('base64url')}`;

export type SlotSearchDeps = { db: Db; jobs: Partial<SlotSearchQueue>; engine: SlotEngine; limits: WaitingJobLimits; now: Date };

/** Unknown elements or a timing without slots are a 400 here, never a failed job; a person over the cap gets 429. */
export async function startSlotSearch(deps: SlotSearchDeps, request: SlotSearchRequest, user: Me): Promise<string> {
  await deps.engine.checkSlotRequest(deps.db, request);
  const id = newSlotSearchId();
  // Committed before the job is sent: a worker that picks the job up at once must find the row.
  await deps.db.transaction(async (tx) => {
    await checkWaitingJobs(tx, deps.limits, 'slotSearches', user.id);
    await insertSlotSearch(tx, { id, request, createdBy: user.id, now: deps.now });
  });
  await enqueueSlotJob(deps, { kind: 'slots', id });
  return id;
}

type StoredResult = { candidates?: unknown[]; summary?: unknown; elements?: unknown[] };

export async function getSlotSearch(db: Db, id: string): Promise<SlotSearch> {
  const row = await selectSlotSearch(db, id);
  if (!row) throw new SlotSearchNotFoundError(id);
  const request = row.request as SlotSearchRequest;
  const result = (row.result ?? null) as StoredResult | null;
  const elements = result?.elements ?? (await nameElements(db, [request]))[0];
  return slotSearchSchema.parse({
    id: row.id,
    status: row.status,
    progress: row.progress ?? null,
    request,
    elements,
    candidates: row.status === 'done' ? result?.candidates ?? [] : [],
    summary: row.status === 'done' ? result?.summary ?? null : null,
    error: row.error,
    createdAt: row.createdAt.toISOString(),
    finishedAt: row.finishedAt?.toISOString() ?? null,
  });
}
