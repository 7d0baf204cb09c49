// GET /api/windows/:id/history: the window's events oldest first with the person's name (never an id), the
// sign-off comments, the window's own plan runs and no other window's; staff only, a tenant gets 404.
import { insertPlannedWindow, setupSignoffApp, type SignoffTestContext } from '../signoff/helpers';

const NOW = new Date('2027-06-07T09:00:00Z');
let ctx: SignoffTestContext;

beforeAll(async () => { ctx = await setupSignoffApp('history', NOW); });
afterAll(async () => {
  await ctx.pool.query(`delete from audit_log where entity_id like $1`, [`${ctx.prefix}%`]);
  await ctx.cleanup();
  await ctx.close();
});

const nameOf = async (id: string) => (await ctx.pool.query('select name from users where id = $1', [id])).rows[0].name as string;

async function auditPlanRun(planId: string, actorId: string, at: Date) {
  await ctx.pool.query(
    `insert into audit_log (at, actor_id, action, entity, entity_id, after) values ($1, $2, 'plan.enqueue', 'plan', $3, '{}'::jsonb)`,
    [at, actorId, planId],
  );
}

test('a submission, a return with its comment and the window\'s own plan run come back in order, with names', async () => {
  const { windowId, planId } = await insertPlannedWindow(ctx, { key: 'hist-a' });
  const other = await insertPlannedWindow(ctx, { key: 'hist-b' });
  await auditPlanRun(planId, ctx.users.planner.id, new Date(NOW.getTime() - 3_600_000));
  await auditPlanRun(other.planId, ctx.users.planner.id, new Date(NOW.getTime() - 3_600_000));

  expect((await (await ctx.as('planner'))('post', `/api/windows/${windowId}/submit`).send({})).status).toBe(200);
  ctx.clock.now = new Date(NOW.getTime() + 60_000);
  const back = await (await ctx.as('approver2'))('post', `/api/signoff/${windowId}/decision`)
    .send({ decision: 'send-back', comment: 'Move it to the weekend.' });
  expect(back.status).toBe(200);

  const res = await (await ctx.as('planner'))('get', `/api/windows/${windowId}/history`);
  expect(res.status).toBe(200);
  const events = res.body.events as { kind: string; at: string; by: string | null; status: string | null; comment: string | null; round: number | null }[];
  expect(events.map((e) => e.kind)).toEqual(['run-started', 'submitted', 'sent-back']);
  expect(events[0]).toMatchObject({ by: await nameOf(ctx.users.planner.id), at: new Date(NOW.getTime() - 3_600_000).toISOString() });
  expect(events[1]).toMatchObject({ by: await nameOf(ctx.users.planner.id), status: 'in-review', round: 1, at: NOW.toISOString() });
  expect(events[2]).toMatchObject({
    by: await nameOf(ctx.userId('approver2')), comment: 'Move it to the weekend.', round: 1, at: ctx.clock.now.toISOString(),
  });
  // The decision row already tells the return; the status row behind it is not shown twice.
  expect(events.filter((e) => e.kind === 'sent-back')).toHaveLength(1);
  for (const e of events) expect(e.by).not.toBe(ctx.users.planner.id);
});

test('a withdrawal carries its reason and the new state', async () => {
  const { windowId } = await insertPlannedWindow(ctx, { key: 'hist-c' });
  const engineer = await ctx.as('engineer');
  const version = (await ctx.pool.query('select version from windows where id = $1', [windowId])).rows[0].version as number;
  const moved = await engineer('post', `/api/windows/${windowId}/transition`).send({ to: 'withdrawn', version, reason: 'Parts did not arrive.' });
  expect(moved.status).toBe(200);
  const res = await engineer('get', `/api/windows/${windowId}/history`);
  expect(res.status).toBe(200);
  expect(res.body.events).toEqual([expect.objectContaining({
    kind: 'moved', status: 'withdrawn', comment: 'Parts did not arrive.', by: await nameOf(ctx.users.engineer.id), reverted: false,
  })]);
});

test('the history is staff-only: a tenant and a user without roles are refused, an unknown window is 404', async () => {
  const { windowId } = await insertPlannedWindow(ctx, { key: 'hist-d' });
  const tenant = await (await ctx.as('tenant'))('get', `/api/windows/${windowId}/history`);
  expect(tenant.status).toBe(404);
  expect(JSON.stringify(tenant.body)).not.toMatch(/events/);
  expect((await (await ctx.as('noRoles'))('get', `/api/windows/${windowId}/history`)).status).toBe(403);
  expect((await (await ctx.as('approver'))('get', `/api/windows/${windowId}/history`)).status).toBe(200);
  expect((await (await ctx.as('admin'))('get', `/api/windows/${ctx.prefix}-nope/history`)).status).toBe(404);
});
