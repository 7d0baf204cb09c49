// Accepting a plan: window → planned with audit; refused (nothing changed) when the plan no longer fits, the
// placements moved underneath, the window was edited, the run is not finished, or an outage is not named.
import { planResponseSchema } from '../../../shared/plans';
import { bookAssessed, closePlansApp, setupPlansNetwork, storeFinishedPlan, windowRow, type PlansContext } from './helpers';

// This file books in October 2027 only.
const NOW = new Date('2027-03-01T08:00:00Z');
let ctx: PlansContext;
let id: (name: string) => string;

beforeAll(async () => ({ ctx, id } = await setupPlansNetwork(NOW)));
afterAll(() => closePlansApp(ctx));

const day = (d: number) => [`2027-10-${String(d).padStart(2, '0')}T22:00:00Z`, `2027-10-${String(d + 1).padStart(2, '0')}T02:00:00Z`] as const;
const p1Down = () => [{ kind: 'span' as const, id: id('p1'), effect: 'down' as const }];

async function acceptedAt(planId: string) {
  return (await ctx.pool.query('select accepted_at from plans where id = $1', [planId])).rows[0].accepted_at as Date | null;
}

test('accepting a finished plan makes it the window\'s plan and moves the window to planned, audited', async () => {
  const w = await bookAssessed(ctx, 'accept', ...day(2), p1Down());
  const { planId, review } = await storeFinishedPlan(ctx, w);
  expect(review.slices.find((s) => s.slice === id('S1'))).toMatchObject({ outcome: 'reroute', after: { paths: { [id('e1')]: [id('a1'), id('bk'), id('b2')] } } });
  const res = await (await ctx.as('planner'))('post', `/api/plans/${planId}/accept`).send({});
  expect(res.status).toBe(200);
  const { plan } = planResponseSchema.parse(res.body);
  expect(plan).toMatchObject({ accepted: true, stale: false, outageAccepted: [] });
  expect(plan.acceptedAt).not.toBeNull();
  expect(await windowRow(ctx, w)).toMatchObject({ status: 'planned', accepted_plan_id: planId });
  const audit = await ctx.pool.query(`select entity, actor_id, before, after from audit_log where action = 'plan.accept' and entity_id in ($1, $2) order by id`, [w, planId]);
  expect(audit.rows.map((r) => r.entity)).toEqual(['window', 'plan']);
  expect(audit.rows[0]).toMatchObject({ actor_id: ctx.users.planner.id, before: { status: 'assessed' }, after: { status: 'planned', planId, acceptedPlanId: planId } });
});

test('a plan that no longer fits the current capacity is refused with the reason, and nothing changes', async () => {
  const w = await bookAssessed(ctx, 'capacity', ...day(5), p1Down());
  const { planId } = await storeFinishedPlan(ctx, w);
  const before = await windowRow(ctx, w);
  await ctx.pool.query('update spans set capacity_gbps = 0.5 where id = $1', [id('bk')]);
  try {
    const res = await (await ctx.as('planner'))('post', `/api/plans/${planId}/accept`).send({});
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('PLAN_NO_LONGER_FITS');
    expect(res.body.error.message).toContain(id('bk'));
  } finally {
    await ctx.pool.query('update spans set capacity_gbps = 1.5 where id = $1', [id('bk')]);
  }
  expect(await windowRow(ctx, w)).toEqual(before);
  expect(await acceptedAt(planId)).toBeNull();
  expect((await ctx.pool.query(`select 1 from audit_log where action = 'plan.accept' and entity_id = $1`, [planId])).rowCount).toBe(0);
  // With the capacity back the same run is accepted: the refusal was about the network, not the run.
  expect((await (await ctx.as('planner'))('post', `/api/plans/${planId}/accept`).send({})).status).toBe(200);
});

test('a plan whose slices were re-placed after the run is refused as NETWORK_CHANGED, naming them', async () => {
  const w = await bookAssessed(ctx, 'moved underneath', ...day(8), p1Down());
  const { planId } = await storeFinishedPlan(ctx, w);
  const s3 = id('S3');
  await ctx.pool.query('update placements set current = false where slice_id = $1', [s3]);
  await ctx.pool.query(`insert into placements (slice_id, revision, current, sites, paths, reason) values ($1, 99, true, $2, $3, 'test')`,
    [s3, JSON.stringify({ [id('h1')]: id('E'), [id('h2')]: id('A') }), JSON.stringify({ [id('e3')]: [id('ea')] })]);
  const untouched = await (await ctx.as('planner'))('post', `/api/plans/${planId}/accept`).send({});
  // S3 is not affected by this window: a new revision with the same placement elsewhere changes nothing.
  expect(untouched.status).toBe(200);
  const w2 = await bookAssessed(ctx, 'moved underneath 2', ...day(11), p1Down());
  const { planId: second } = await storeFinishedPlan(ctx, w2);
  const s1 = id('S1');
  await ctx.pool.query('update placements set current = false where slice_id = $1', [s1]);
  await ctx.pool.query(`insert into placements (slice_id, revision, current, sites, paths, reason) values ($1, 99, true, $2, $3, 'test')`,
    [s1, JSON.stringify({ [id('f1')]: id('A'), [id('f2')]: id('B') }), JSON.stringify({ [id('e1')]: [id('a1'), id('bk'), id('b2')] })]);
  try {
    const res = await (await ctx.as('planner'))('post', `/api/plans/${second}/accept`).send({});
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('NETWORK_CHANGED');
    expect(res.body.error.message).toContain(s1);
    expect(await windowRow(ctx, w2)).toMatchObject({ status: 'assessed', accepted_plan_id: null });
  } finally {
    await ctx.pool.query('delete from placements where slice_id = $1 and revision = 99', [s1]);
    await ctx.pool.query('update placements set current = true where slice_id = $1 and revision = 1', [s1]);
  }
});

test('editing the window makes its runs stale: the accepted one is dropped and none can be accepted', async () => {
  const w = await bookAssessed(ctx, 'stale', ...day(14), p1Down());
  const { planId } = await storeFinishedPlan(ctx, w);
  const planner = await ctx.as('planner');
  expect((await planner('post', `/api/plans/${planId}/accept`).send({})).status).toBe(200);
  const { version } = await windowRow(ctx, w);
  // A new title keeps the impact: the plan still holds.
  expect((await planner('patch', `/api/windows/${w}`).send({ version, title: `${ctx.prefix} stale renamed` })).status).toBe(200);
  expect((await planner('get', `/api/plans/${planId}`)).body.plan).toMatchObject({ stale: false, accepted: true });
  const edit = await planner('patch', `/api/windows/${w}`).send({ version: version + 1, endsAt: '2027-10-15T03:00:00Z' });
  expect(edit.body).toMatchObject({ reverted: true, window: { status: 'draft' } });
  expect(await windowRow(ctx, w)).toMatchObject({ status: 'draft', accepted_plan_id: null });
  expect((await planner('get', `/api/plans/${planId}`)).body.plan).toMatchObject({ stale: true, accepted: false });
  expect((await planner('post', `/api/windows/${w}/assess`).send({})).status).toBe(200);
  const res = await planner('post', `/api/plans/${planId}/accept`).send({});
  expect(res.status).toBe(409);
  expect(res.body.error.code).toBe('PLAN_STALE');
  expect((await windowRow(ctx, w)).status).toBe('assessed');
});

test('every slice a plan leaves unresolved must be named in outageAccepted, and only those', async () => {
  // With p1 and H1 out, site A has no way to B: S1 (fixed on A and B) cannot be served.
  const w = await bookAssessed(ctx, 'outage', ...day(17), [...p1Down(), { kind: 'site', id: id('H1'), effect: 'down' }]);
  const { planId, review } = await storeFinishedPlan(ctx, w);
  const unresolved = review.slices.filter((s) => s.outcome === 'unresolved').map((s) => s.slice);
  expect(unresolved).toContain(id('S1'));
  const planner = await ctx.as('planner');
  const none = await planner('post', `/api/plans/${planId}/accept`).send({});
  expect(none.status).toBe(400);
  expect(none.body.error.code).toBe('OUTAGE_NOT_ACCEPTED');
  expect(none.body.error.message).toContain(id('S1'));
  const extra = await planner('post', `/api/plans/${planId}/accept`).send({ outageAccepted: [...unresolved, id('S2')] });
  expect(extra.status).toBe(400);
  expect(extra.body.error.message).toContain(id('S2'));
  expect((await windowRow(ctx, w)).status).toBe('assessed');
  const ok = await planner('post', `/api/plans/${planId}/accept`).send({ outageAccepted: unresolved });
  expect(ok.status).toBe(200);
  expect(ok.body.plan.outageAccepted.sort()).toEqual([...unresolved].sort());
});

test('a run that has not finished, or a window no longer being planned, cannot be accepted', async () => {
  const w = await bookAssessed(ctx, 'not done', ...day(20), p1Down());
  const planner = await ctx.as('planner');
  const queued = await planner('post', `/api/windows/${w}/plans`).send({});
  const res = await planner('post', `/api/plans/${queued.body.plan.id}/accept`).send({});
  expect(res.status).toBe(409);
  expect(res.body.error.code).toBe('PLAN_NOT_DONE');
  const { planId } = await storeFinishedPlan(ctx, w);
  const { version } = await windowRow(ctx, w);
  expect((await planner('post', `/api/windows/${w}/transition`).send({ to: 'withdrawn', version })).status).toBe(200);
  const withdrawn = await planner('post', `/api/plans/${planId}/accept`).send({});
  expect(withdrawn.status).toBe(409);
  expect(withdrawn.body.error.code).toBe('WINDOW_NOT_PLANNABLE');
  expect((await planner('post', `/api/plans/${planId}/accept`).send({ outageAccepted: 'S1' })).status).toBe(400);
});
