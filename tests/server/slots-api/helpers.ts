// Slot-search and campaign API test harness: a scratch database of its own (the finder reads the whole inventory
// and every window), the plans tests' small backup network, and a queue that records slot-search jobs.
import { createRecordingQueue, type RecordingQueue } from '../helpers/jobs';
import { removePrefixed } from '../helpers/remove-prefixed';
import { useScratchDatabase } from '../helpers/scratch-database';
import { signedInRequests, type AsUser } from '../helpers/sign-in';
import { setupTestApp, type TestContext } from '../helpers/test-app';
import { insertBackupNetwork } from '../plans/helpers';
import type { SlotSearchJob } from '../../../server/services/ports';

export type SlotsQueue = RecordingQueue & { slotJobs: SlotSearchJob[]; sendSlotSearch(job: SlotSearchJob): Promise<string> };

export type SlotsContext = TestContext & {
  queue: SlotsQueue;
  as: AsUser<keyof TestContext['users']>;
  /** `${prefix}-name`: ids of the backup network (tests/server/plans/helpers.ts) */
  id: (name: string) => string;
  close: () => Promise<void>;
};

export async function setupSlotsApp(now: Date): Promise<SlotsContext> {
  await useScratchDatabase('slotsapi');
  const ctx = await setupTestApp();
  const recording = createRecordingQueue();
  const slotJobs: SlotSearchJob[] = [];
  const queue: SlotsQueue = Object.assign(recording, {
    slotJobs,
    async sendSlotSearch(job: SlotSearchJob) {
      slotJobs.push(job);
      return `slot-job-${slotJobs.length}`;
    },
  });
  const app = ctx.makeApp({ now: () => now, jobs: queue });
  const { id } = await insertBackupNetwork(ctx);
  const as: SlotsContext['as'] = signedInRequests(app, (role) => ctx.users[role].email);
  const close = async () => {
    await removePrefixed(ctx.pool, ctx.prefix, [
      ['windows', ['title', 'owner_id']], ['freezes', ['id']], ['campaigns', ['created_by']], ['slot_searches', ['created_by']],
    ]);
    await ctx.close();
  };
  return { ...ctx, app, queue, as, id, close };
}
