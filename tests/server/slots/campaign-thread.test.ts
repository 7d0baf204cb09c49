// A campaign's scheduling in a worker thread (server/jobs/campaign-thread.ts): the same schedule as the planner's on
// the calling thread for the same seed, its progress as messages, the event loop turning while it searches, errors
// as rejections with their message, and a stopped job ending the thread.
import type { Worker } from 'node:worker_threads';
import { scheduleCampaign, type CampaignProblem } from '../../../planner/campaign/schedule-campaign';
import { createRng, randomInt, type Rng } from '../../../planner/random/rng';
import { campaignThreadScheduler, threadScheduleCampaign, withCampaignThread } from '../../../server/jobs/campaign-thread';
import { packCampaign, unpackCampaign } from '../../../server/jobs/campaign-transfer';
import type { SlotEngine } from '../../../server/services/campaigns/engine';
import { SCHEDULING_STOPPED } from '../../../server/services/campaigns/run-schedule';
import { slotEngine } from '../../../server/services/campaigns/slot-engine';
import { turnsWhile } from '../helpers/event-loop-turns';

const HOUR_MS = 3_600_000;

interface Shape { groups: number; nights: number; startsHours: number[]; slicePool: number; clashes: number; maxPerNight: number; days: number }

/** A seeded campaign: each group with most of its nights' starts usable at random costs, random touched slices and clashes. */
function randomProblem(shape: Shape, rng: Rng): CampaignProblem {
  const pool = Array.from({ length: shape.slicePool }, (_, i) => `slice-${i}`);
  const groups = Array.from({ length: shape.groups }, (_, g) => {
    const base = randomInt(rng, 80);
    const slots = Array.from({ length: shape.nights }, (_, n) => shape.startsHours.map((h) => {
      const startMs = Date.UTC(2029, 4, 1 + n) + h * HOUR_MS;
      return { startMs, endMs: startMs + 3 * HOUR_MS, night: new Date(Date.UTC(2029, 4, 1 + n)).toISOString().slice(0, 10), cost: base + randomInt(rng, 120) };
    })).flat().filter(() => rng() < 0.85);
    const touched = [...new Set(Array.from({ length: 2 + randomInt(rng, 4) }, () => pool[randomInt(rng, pool.length)]))];
    return { label: `Group ${g + 1}`, slots, touched };
  });
  const clashes = new Map<string, [number, number]>();
  while (clashes.size < shape.clashes) {
    const i = randomInt(rng, shape.groups);
    const j = randomInt(rng, shape.groups);
    if (i !== j) clashes.set(`${Math.min(i, j)}:${Math.max(i, j)}`, [Math.min(i, j), Math.max(i, j)]);
  }
  return { groups, rules: { maxPerNight: shape.maxPerNight, minDaysBetweenTouches: shape.days }, clashes: [...clashes.values()] };
}

/** A rollout of a few dozen groups over three weeks, two starts a night. */
const rollout = () => randomProblem({ groups: 36, nights: 21, startsHours: [22, 24.5], slicePool: 60, clashes: 15, maxPerNight: 2, days: 7 }, createRng(36));
/** The largest campaign the form allows: 100 groups, 92 nights, a start every 15 minutes from 20:00 to 03:45. */
const largest = () => randomProblem({
  groups: 100, nights: 92, startsHours: Array.from({ length: 32 }, (_, k) => 20 + k / 4), slicePool: 150, clashes: 250, maxPerNight: 2, days: 10,
}, createRng(100));

test('a problem packed for the thread unpacks to the same problem, labelled or not, with groups that have no slot', () => {
  const labelled = rollout();
  expect(unpackCampaign(packCampaign(labelled))).toEqual(labelled);
  const bare: CampaignProblem = {
    ...labelled, groups: labelled.groups.map(({ slots, touched }, g) => ({ slots: g % 5 === 0 ? [] : slots, touched })),
  };
  const back = unpackCampaign(packCampaign(bare));
  expect(back).toEqual(bare);
  expect(back.groups.every((g) => !('label' in g))).toBe(true);
  // Costs and instants keep every digit.
  const odd = { ...bare, groups: [{ slots: [{ startMs: 1_893_456_000_123, endMs: 1_893_466_800_456, night: '2030-01-01', cost: 0.1 + 0.2 }], touched: [] }] };
  expect(unpackCampaign(packCampaign(odd))).toEqual(odd);
});

test('the thread schedules as the planner does on the calling thread, and reports progress up to the budget', async () => {
  const p = rollout();
  const opts = { seed: 7, maxIterations: 20_000 };
  const progress: Array<[number, number]> = [];
  const theirs = await threadScheduleCampaign(p, { ...opts, onProgress: (done, total) => progress.push([done, total]) });
  const mine = scheduleCampaign(p, opts);
  expect(theirs).toEqual(mine);
  // A schedule the search changed, so equal answers are not two constructive starts.
  expect(mine.moves).toBeGreaterThan(0);
  expect(mine.assignment.filter((s) => s !== null).length).toBeGreaterThan(10);
  expect(progress.length).toBeGreaterThan(1);
  expect(progress.at(-1)).toEqual([20_000, 20_000]);
  expect(progress.every(([done, total], k) => total === 20_000 && done >= (progress[k - 1]?.[0] ?? 0))).toBe(true);
  // A different seed searches differently: the seed reaches the thread.
  expect(await threadScheduleCampaign(p, { seed: 8, maxIterations: 20_000 })).toEqual(scheduleCampaign(p, { seed: 8, maxIterations: 20_000 }));
});

/**
 * Event-loop turns (setImmediate callbacks) between the scheduling's first progress report and its answer: while
 * the search runs. Work on the calling thread reports and answers without the loop turning in between.
 */
async function turnsWhileSearching(scheduleOn: SlotEngine['scheduleCampaign'], p: CampaignProblem) {
  let turnsAtFirstReport: number | null = null;
  let reports = 0;
  const { turns, value: schedule } = await turnsWhile((turnsNow) =>
    scheduleOn(p, { seed: 1, onProgress: () => { reports += 1; turnsAtFirstReport ??= turnsNow(); } }));
  return { schedule, reports, turns: turns - (turnsAtFirstReport ?? turns) };
}

test('the event loop keeps turning while the largest campaign schedules in the thread; on the calling thread it stalls', async () => {
  const p = largest();
  const inThread = await turnsWhileSearching(threadScheduleCampaign, p);
  expect(inThread.reports).toBeGreaterThan(10);
  expect(inThread.turns).toBeGreaterThanOrEqual(10);

  const here = await turnsWhileSearching(slotEngine.scheduleCampaign, p);
  expect(here.schedule).toEqual(inThread.schedule);
  expect(here.reports).toBe(inThread.reports);
  expect(here.turns).toBe(0);
});

test('an error inside the thread rejects the call with its message', async () => {
  await expect(threadScheduleCampaign(rollout(), { maxIterations: -5 }))
    .rejects.toThrow(/^the campaign scheduling failed: maxIterations must be a whole number/);
  const clashWithNobody: CampaignProblem = { ...rollout(), clashes: [[0, 99]] };
  await expect(threadScheduleCampaign(clashWithNobody)).rejects.toThrow(/^the campaign scheduling failed: /);
});

test('a stopped job ends the thread at its next look at the signal; one stopped before never starts it', async () => {
  const threads: Worker[] = [];
  const schedule = campaignThreadScheduler((w) => threads.push(w));
  const signal = { aborted: false };
  const reports: number[] = [];
  const stopped = schedule(largest(), { signal, onProgress: (done) => { reports.push(done); signal.aborted = true; } });
  await expect(stopped).rejects.toThrow(SCHEDULING_STOPPED);
  expect(reports).toHaveLength(1);
  expect(reports[0]).toBeLessThan(100_000);
  // The search had most of its budget left: a thread still running it would still have its id.
  expect(threads).toHaveLength(1);
  expect(threads[0].threadId).toBe(-1);

  const never = { aborted: true };
  let progressed = false;
  await expect(schedule(rollout(), { signal: never, onProgress: () => { progressed = true; } })).rejects.toThrow(SCHEDULING_STOPPED);
  await expect(slotEngine.scheduleCampaign(rollout(), { signal: never })).rejects.toThrow(SCHEDULING_STOPPED);
  expect(progressed).toBe(false);
  expect(threads).toHaveLength(1);
});

test('the slot jobs\' engine schedules in the thread and keeps the rest of the engine it wraps', () => {
  const engine = withCampaignThread(slotEngine);
  expect(engine.scheduleCampaign).toBe(threadScheduleCampaign);
  expect(engine.findSlotsForGroups).toBe(slotEngine.findSlotsForGroups);
  expect(engine.campaignIssues).toBe(slotEngine.campaignIssues);
});
