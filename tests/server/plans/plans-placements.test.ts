// After acceptance: starting the work makes the plan's placements current (a new revision per moved slice);
// finishing with `return` or rolling back restores the ones from before; `keep` leaves the plan's in place.
import { loadNetworkScenario } from '../../../server/services/inventory/load-network-scenario';
import type { PlacementView } from '../../../shared/plans';
import { bookAssessed, closePlansApp, setupPlansNetwork, storeFinishedPlan, windowRow, type PlansContext } from './helpers';

// This file books in December 2027 only.
const NOW = new Date('2027-03-01T08:00:00Z');
let ctx: PlansContext;
let id: (name: string) => string;

beforeAll(async () => ({ ctx, id } = await setupPlansNetwork(NOW)));
afterAll(() => closePlansApp(ctx));

type Revision = { revision: number; current: boolean; reason: string; sites: Record<string, string>; paths: Record<string, string[]> };

async function revisions(slice: string): Promise<Revision[]> {
  const { rows } = await ctx.pool.query('select revision, current, reason, sites, paths from placements where slice_id = $1 order by revision', [slice]);
  return rows;
}
const current = async (slice: string) => (await revisions(slice)).filter((r) => r.current);
const placementOf = (r: Revision): PlacementView => ({ sites: r.sites, paths: r.paths });

/** An accepted plan for site E going down (S3's movable function sits there), with the window brought to `notified`. */
async function acceptedWindow(title: string, dayOfMonth: number, afterWindow: 'return' | 'keep') {
  const d = String(dayOfMonth).padStart(2, '0');
  const w = await bookAssessed(ctx, title, `2027-12-${d}T22:00:00Z`, `2027-12-${d}T23:30:00Z`, [{ kind: 'site', id: id('E'), effect: 'down' }]);
  const { planId, review } = await storeFinishedPlan(ctx, w, { settings: { afterWindow } });
  const s3 = review.slices.find((s) => s.slice === id('S3'))!;
  expect(s3.outcome).toBe('move');
  expect((await (await ctx.as('planner'))('post', `/api/plans/${planId}/accept`).send({})).status).toBe(200);
  // Sign-off and notices are other services' steps; this file starts from where they leave the window.
  await ctx.pool.query(`update windows set status = 'notified' where id = $1`, [w]);
  return { w, planId, s3 };
}

async function transition(w: string, to: string) {
  const { version } = await windowRow(ctx, w);
  const res = await (await ctx.as('engineer'))('post', `/api/windows/${w}/transition`).send({ to, version });
  expect([to, res.status]).toEqual([to, 200]);
}

test('underway applies the plan as a new revision; done with `return` restores the placement from before', async () => {
  const { w, planId, s3 } = await acceptedWindow('return', 2, 'return');
  const s3Id = id('S3');
  const [original] = await current(s3Id);
  await transition(w, 'underway');
  const during = await revisions(s3Id);
  expect(during.map((r) => [r.revision, r.current])).toEqual([[original.revision, false], [original.revision + 1, true]]);
  expect(placementOf(during[1])).toEqual(s3.after);
  expect(during[1].reason).toBe(`plan:${planId}`);
  // Slices the plan leaves where they are get no revision.
  expect((await revisions(id('S1'))).map((r) => r.revision)).toEqual([1]);
  await transition(w, 'done');
  const after = await current(s3Id);
  expect(after).toHaveLength(1);
  expect(after[0]).toMatchObject({ revision: original.revision + 2, reason: `plan:${planId}:return` });
  expect(placementOf(after[0])).toEqual(s3.before);
  expect(placementOf(after[0])).toEqual(placementOf(original));
  const audit = await ctx.pool.query(`select action, after from audit_log where entity = 'slice' and entity_id = $1 and after ->> 'reason' like $2 order by id`, [s3Id, `plan:${planId}%`]);
  expect(audit.rows.map((r) => [r.action, r.after.revision])).toEqual([
    ['placement.plan-apply', original.revision + 1], ['placement.plan-return', original.revision + 2]]);
});

test('rolling the work back restores the placement from before as well', async () => {
  const { w, planId, s3 } = await acceptedWindow('roll back', 6, 'keep');
  const s3Id = id('S3');
  const [original] = await current(s3Id);
  await transition(w, 'underway');
  expect(placementOf((await current(s3Id))[0])).toEqual(s3.after);
  await transition(w, 'rolled-back');
  const [restored] = await current(s3Id);
  expect(restored).toMatchObject({ revision: original.revision + 2, reason: `plan:${planId}:rollback` });
  expect(placementOf(restored)).toEqual(placementOf(original));
});

test('done with `keep` leaves the plan\'s placement current, with no further revision', async () => {
  const { w, planId, s3 } = await acceptedWindow('keep', 10, 'keep');
  const s3Id = id('S3');
  const [original] = await current(s3Id);
  await transition(w, 'underway');
  await transition(w, 'done');
  const all = await revisions(s3Id);
  expect(all.at(-1)).toMatchObject({ revision: original.revision + 1, current: true, reason: `plan:${planId}` });
  expect(placementOf(all.at(-1)!)).toEqual(s3.after);
  expect(all.filter((r) => r.current)).toHaveLength(1);
  // The inventory every later impact and plan is computed from now has the kept placement as today's.
  const today = (await loadNetworkScenario(ctx.db)).placements.find((p) => p.slice === s3Id);
  expect({ sites: today?.sites, paths: today?.paths }).toEqual(s3.after);
});
