// Running plans through the API: validation, window states, the queue (and when it is down), reads, cancel, roles.
import { planExpireSeconds } from '../../../server/services/plans/expire';
import { planListResponseSchema, planResponseSchema } from '../../../shared/plans';
import { bookAssessed, closePlansApp, setupPlansNetwork, storeFinishedPlan, type PlansContext } from './helpers';

// This file books in September 2027 only (other plans files use other months: reservations follow time overlap).
const NOW = new Date('2027-03-01T08:00:00Z');
let ctx: PlansContext;
let id: (name: string) => string;
let windowId: string;

beforeAll(async () => {
  ({ ctx, id } = await setupPlansNetwork(NOW));
  windowId = await bookAssessed(ctx, 'p1 splice', '2027-09-02T22:00:00Z', '2027-09-03T02:00:00Z', [{ kind: 'span', id: id('p1'), effect: 'down' }]);
});
afterAll(() => closePlansApp(ctx));

const planCount = async (w: string) => Number((await ctx.pool.query('select count(*) from plans where window_id = $1', [w])).rows[0].count);

test('a planner runs a plan: stored queued with its settings, handed to the queue with the expiry, audited', async () => {
  const planner = await ctx.as('planner');
  const res = await planner('post', `/api/windows/${windowId}/plans`).send({ seed: 7, timeLimitSeconds: 5, pinned: [id('h1')], afterWindow: 'keep' });
  expect(res.status).toBe(202);
  const { plan } = planResponseSchema.parse(res.body);
  expect(plan).toMatchObject({ windowId, status: 'queued', stale: false, accepted: false, review: null, createdBy: ctx.users.planner.id });
  expect(plan.id).toMatch(/^pl-/);
  expect(plan.settings).toEqual({ mode: 'serial', seed: 7, population: 40, timeLimitSeconds: 5, pinned: [id('h1')], excludedSites: [], afterWindow: 'keep', knockOn: true, maxKnockOnMoves: 5 });
  const run = ctx.queue.planRuns.find((r) => r.planId === plan.id);
  expect(run?.expireInSeconds).toBe(planExpireSeconds(plan.settings, ctx.config));
  expect(run?.expireInSeconds).toBe(5 * 3 + 60 + ctx.config.planExpireMarginSeconds);
  const row = (await ctx.pool.query('select job_id, window_version from plans where id = $1', [plan.id])).rows[0];
  expect(row.job_id).toBe(run?.jobId);
  const audit = await ctx.pool.query(`select actor_id, after from audit_log where entity = 'plan' and entity_id = $1 and action = 'plan.enqueue'`, [plan.id]);
  expect(audit.rows).toHaveLength(1);
  expect(audit.rows[0]).toMatchObject({ actor_id: ctx.users.planner.id, after: { status: 'queued', windowId } });
});

test('unknown pinned functions or excluded sites are named (400) and nothing is stored', async () => {
  const before = await planCount(windowId);
  const res = await (await ctx.as('planner'))('post', `/api/windows/${windowId}/plans`)
    .send({ pinned: [id('f1'), 'no-such-fn'], excludedSites: [id('H1'), 'no-such-site'] });
  expect(res.status).toBe(400);
  expect(res.body.error.code).toBe('UNKNOWN_PLAN_INPUTS');
  expect(res.body.error.message).toContain('no-such-fn');
  expect(res.body.error.message).toContain('no-such-site');
  expect(res.body.error.message).not.toContain(id('H1'));
  const bad = await (await ctx.as('planner'))('post', `/api/windows/${windowId}/plans`).send({ population: 3, extra: true });
  expect(bad.status).toBe(400);
  expect(bad.body.error.code).toBe('VALIDATION_FAILED');
  expect(await planCount(windowId)).toBe(before);
});

test('a draft window, or one without its impact, cannot be planned (409)', async () => {
  const planner = await ctx.as('planner');
  const booked = await planner('post', '/api/windows').send({ title: `${ctx.prefix} draft`, startsAt: '2027-09-10T22:00:00Z',
    endsAt: '2027-09-11T02:00:00Z', elements: [{ kind: 'span', id: id('p2'), effect: 'down' }] });
  const draft = await planner('post', `/api/windows/${booked.body.window.id}/plans`).send({});
  expect(draft.status).toBe(409);
  expect(draft.body.error.code).toBe('WINDOW_NOT_PLANNABLE');
  const other = await bookAssessed(ctx, 'no impact', '2027-09-12T22:00:00Z', '2027-09-13T02:00:00Z', [{ kind: 'span', id: id('p2'), effect: 'down' }]);
  await ctx.pool.query('delete from window_impacts where window_id = $1', [other]);
  const noImpact = await planner('post', `/api/windows/${other}/plans`).send({});
  expect(noImpact.status).toBe(409);
  expect(noImpact.body.error.code).toBe('IMPACT_NOT_CURRENT');
  expect((await planner('post', '/api/windows/no-such-window/plans').send({})).status).toBe(404);
});

test('when the queue does not take the run the answer is 503 and the run is failed with the reason, not left queued', async () => {
  const ids = async () => (await ctx.pool.query('select id from plans where window_id = $1', [windowId])).rows.map((r) => r.id as string);
  const earlier = new Set(await ids());
  ctx.queue.failing = true;
  try {
    const res = await (await ctx.as('planner'))('post', `/api/windows/${windowId}/plans`).send({});
    expect(res.status).toBe(503);
    expect(res.body.error.code).toBe('QUEUE_UNAVAILABLE');
  } finally {
    ctx.queue.failing = false;
  }
  const added = (await ids()).filter((x) => !earlier.has(x));
  expect(added).toHaveLength(1);
  const { rows } = await ctx.pool.query('select status, error, finished_at from plans where id = $1', [added[0]]);
  expect(rows[0].status).toBe('failed');
  expect(rows[0].error).toContain('connection refused');
  expect(rows[0].finished_at).not.toBeNull();
});

test('the list shows the window\'s runs newest first, with totals for finished ones; one run reads with its review', async () => {
  const { planId, review } = await storeFinishedPlan(ctx, windowId);
  const approver = await ctx.as('approver');
  const list = await approver('get', `/api/windows/${windowId}/plans`);
  expect(list.status).toBe(200);
  const { plans } = planListResponseSchema.parse(list.body);
  expect(plans.length).toBeGreaterThanOrEqual(3);
  const created = plans.map((p) => p.createdAt);
  expect([...created].sort().reverse()).toEqual(created);
  const done = plans.find((p) => p.id === planId)!;
  expect(done.totals).toEqual(review.totals);
  expect(plans.filter((p) => p.status !== 'done').every((p) => p.totals === null)).toBe(true);
  const one = await (await ctx.as('admin'))('get', `/api/plans/${planId}`);
  expect(one.status).toBe(200);
  expect(planResponseSchema.parse(one.body).plan.review?.slices.map((s) => s.slice)).toEqual(review.slices.map((s) => s.slice));
  const missing = await approver('get', '/api/plans/pl-nothing');
  expect(missing.status).toBe(404);
  expect(missing.body.error.code).toBe('PLAN_NOT_FOUND');
});

test('cancel: a queued run becomes cancelled by the planner and its job is cancelled; other states are refused', async () => {
  const planner = await ctx.as('planner');
  const started = await planner('post', `/api/windows/${windowId}/plans`).send({});
  const planId = started.body.plan.id as string;
  const res = await planner('post', `/api/plans/${planId}/cancel`).send({});
  expect(res.status).toBe(200);
  expect(res.body.plan).toMatchObject({ status: 'cancelled', error: `Cancelled by User ${ctx.users.planner.id}` });
  expect(ctx.queue.cancelled).toContain(ctx.queue.planRuns.find((r) => r.planId === planId)!.jobId);
  const again = await planner('post', `/api/plans/${planId}/cancel`).send({});
  expect(again.status).toBe(409);
  expect(again.body.error.code).toBe('PLAN_NOT_CANCELLABLE');
  const { planId: doneId } = await storeFinishedPlan(ctx, windowId, { settings: { timeLimitSeconds: 1 } });
  expect((await planner('post', `/api/plans/${doneId}/cancel`).send({})).status).toBe(409);
  const audit = await ctx.pool.query(`select after from audit_log where entity_id = $1 and action = 'plan.cancel'`, [planId]);
  expect(audit.rows[0].after).toMatchObject({ status: 'cancelled' });
});

test('roles: only planners run, cancel and accept; approvers and admins read; engineers 403; tenants 404 everywhere', async () => {
  const { planId } = await storeFinishedPlan(ctx, windowId);
  const routes: ['get' | 'post', string][] = [
    ['post', `/api/windows/${windowId}/plans`], ['get', `/api/windows/${windowId}/plans`],
    ['get', `/api/plans/${planId}`], ['post', `/api/plans/${planId}/cancel`], ['post', `/api/plans/${planId}/accept`],
  ];
  const before = await planCount(windowId);
  for (const [method, path] of routes) {
    const tenant = await (await ctx.as('tenant'))(method, path).send({});
    expect([path, tenant.status]).toEqual([path, 404]);
    // The same answer as for a route that does not exist: nothing tells a tenant that plans are there.
    expect(tenant.body).toEqual({ error: { code: 'ROUTE_NOT_FOUND', message: `No API route for ${method.toUpperCase()} ${path}.` } });
    expect([path, (await (await ctx.as('engineer'))(method, path).send({})).status]).toEqual([path, 403]);
    expect([path, (await (await ctx.as('noRoles'))(method, path).send({})).status]).toEqual([path, 403]);
  }
  for (const role of ['approver', 'admin'] as const) {
    for (const [method, path] of routes) {
      const status = (await (await ctx.as(role))(method, path).send({})).status;
      expect([role, path, status]).toEqual([role, path, method === 'get' ? 200 : 403]);
    }
  }
  expect(await planCount(windowId)).toBe(before);
  const anonymous = await (await import('supertest')).default(ctx.app).get(`/api/plans/${planId}`);
  expect(anonymous.status).toBe(401);
});
