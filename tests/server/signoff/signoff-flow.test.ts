// Submit → approvals to the quorum → cleared with notices issued in the same transaction; send-back → returned
// with mail to the planner; self-sign-off, comments, one decision per round, and who may do what.
import * as notices from '../../../server/services/notices/issue-notices';
import { insertPlannedWindow, setupSignoffApp, windowStatus, type SignoffTestContext } from './helpers';

const NOW = new Date('2027-05-03T09:00:00Z');
let ctx: SignoffTestContext;

beforeAll(async () => { ctx = await setupSignoffApp('flow', NOW); });
afterAll(async () => {
  await ctx.cleanup();
  await ctx.close();
});
afterEach(() => jest.restoreAllMocks());

const approve = (comment = 'Looks right; the moves are hitless.') => ({ decision: 'approve', comment });

async function submit(windowId: string) {
  const res = await (await ctx.as('planner'))('post', `/api/windows/${windowId}/submit`).send({});
  expect(res.status).toBe(200);
  return res;
}

test('submitting e-mails every approver a link to the sign-off screen and starts review round 1', async () => {
  const { windowId, planId } = await insertPlannedWindow(ctx, { key: 'submit' });
  const before = ctx.recorded.mails.length;
  const res = await submit(windowId);
  expect(res.body).toMatchObject({ windowId, status: 'in-review', round: 1 });
  const approvers = (await ctx.pool.query(`select u.email from users u join role_grants g on g.user_id = u.id and g.role = 'approver'`)).rows.map((r) => r.email);
  const mails = ctx.recorded.mails.slice(before);
  expect(res.body.approversMailed).toBe(approvers.length);
  expect(mails.flatMap((m) => m.to).sort()).toEqual([...approvers].sort());
  for (const mail of mails) expect(mail.text).toContain(`${ctx.config.publicUrl}/sign-off/${windowId}`);
  const row = (await ctx.pool.query('select status, review_round from windows where id = $1', [windowId])).rows[0];
  expect(row).toEqual({ status: 'in-review', review_round: 1 });
  const audit = await ctx.pool.query(`select actor_id, after from audit_log where entity_id = $1 and action = 'signoff.submit'`, [windowId]);
  expect(audit.rows[0]).toMatchObject({ actor_id: ctx.users.planner.id, after: { status: 'in-review', planId, round: 1 } });
  // Submitting twice is a state error, not a second round.
  expect((await (await ctx.as('planner'))('post', `/api/windows/${windowId}/submit`).send({})).status).toBe(409);
});

test('a window without an accepted plan cannot be submitted', async () => {
  const { windowId } = await insertPlannedWindow(ctx, { key: 'noplan' });
  await ctx.pool.query('update windows set accepted_plan_id = null where id = $1', [windowId]);
  const res = await (await ctx.as('planner'))('post', `/api/windows/${windowId}/submit`).send({});
  expect(res.status).toBe(409);
  expect(res.body.error.code).toBe('NO_ACCEPTED_PLAN');
});

test('a critical slice makes it high risk: the first approval is recorded, the second clears and issues notices in the same transaction', async () => {
  const { windowId } = await insertPlannedWindow(ctx, { key: 'quorum', critical: true });
  await submit(windowId);
  const seen: { windowId: string; actorId: string; statusInTx: string }[] = [];
  const original = notices.issueNotices;
  jest.spyOn(notices, 'issueNotices').mockImplementation(async (tx, deps, id, actorId) => {
    const { rows } = await (tx as unknown as { execute: (q: string) => Promise<{ rows: { status: string }[] }> })
      .execute(`select status from windows where id = '${id}'`);
    seen.push({ windowId: id, actorId, statusInTx: rows[0].status });
    expect(deps.jobs).toBeDefined();
    return original(tx, deps, id, actorId);
  });
  const first = await (await ctx.as('approver'))('post', `/api/signoff/${windowId}/decision`).send(approve());
  expect(first.status).toBe(200);
  expect(first.body).toMatchObject({ status: 'in-review', approvals: 1, quorum: 2, notices: null });
  expect(seen).toHaveLength(0);
  const second = await (await ctx.as('approver2'))('post', `/api/signoff/${windowId}/decision`).send(approve('Agreed with the service’s operations team.'));
  expect(second.status).toBe(200);
  expect(second.body).toMatchObject({ approvals: 2, quorum: 2 });
  expect(second.body.notices).toEqual(expect.objectContaining({ queued: expect.any(Number), blocked: expect.any(Number) }));
  expect(seen).toEqual([{ windowId, actorId: ctx.userId('approver2'), statusInTx: 'cleared' }]);
  expect(['cleared', 'notified']).toContain(await windowStatus(ctx, windowId));
  const audit = await ctx.pool.query(`select actor_id, at, after from audit_log where entity_id = $1 and action = 'signoff.decision' order by id`, [windowId]);
  expect(audit.rows.map((r) => [r.actor_id, r.after.decision, r.after.comment, r.after.codeConfirmed])).toEqual([
    [ctx.users.approver.id, 'approve', 'Looks right; the moves are hitless.', false],
    [ctx.userId('approver2'), 'approve', 'Agreed with the service’s operations team.', false],
  ]);
  expect(new Date(audit.rows[0].at).toISOString()).toBe(NOW.toISOString());
});

test('a low-risk plan clears with one approval (default low quorum)', async () => {
  const { windowId } = await insertPlannedWindow(ctx, { key: 'low' });
  await submit(windowId);
  const res = await (await ctx.as('approver3'))('post', `/api/signoff/${windowId}/decision`).send(approve());
  expect(res.body).toMatchObject({ approvals: 1, quorum: 1 });
  expect(['cleared', 'notified']).toContain(await windowStatus(ctx, windowId));
});

test('a send-back returns the window at once and e-mails the accepting planner and the owner with the comment', async () => {
  const { windowId } = await insertPlannedWindow(ctx, { key: 'sendback', severity: 'high' });
  await submit(windowId);
  await (await ctx.as('approver'))('post', `/api/signoff/${windowId}/decision`).send(approve());
  const before = ctx.recorded.mails.length;
  const comment = 'Move the splice out of the school-run hours; the reroute crowds the ring.';
  const res = await (await ctx.as('approver2'))('post', `/api/signoff/${windowId}/decision`).send({ decision: 'send-back', comment });
  expect(res.body).toMatchObject({ status: 'returned', quorum: 2 });
  expect(await windowStatus(ctx, windowId)).toBe('returned');
  const mails = ctx.recorded.mails.slice(before);
  expect(mails.flatMap((m) => m.to).sort()).toEqual([ctx.users.engineer.email, ctx.users.planner.email].sort());
  for (const mail of mails) expect(mail.text).toContain(comment);
  // The round is over: no more decisions until it is submitted again.
  const late = await (await ctx.as('approver3'))('post', `/api/signoff/${windowId}/decision`).send(approve());
  expect(late.status).toBe(409);
  expect(late.body.error.code).toBe('NOT_IN_REVIEW');
});

test('an approver who booked the window, made the plan or accepted it is refused', async () => {
  const cases = [{ ownerId: ctx.userId('approver3') }, { planCreatedBy: ctx.userId('approver3') }, { acceptedBy: ctx.userId('approver3') }];
  for (const [i, c] of cases.entries()) {
    const { windowId } = await insertPlannedWindow(ctx, { key: `self${i}`, ...c });
    await submit(windowId);
    const res = await (await ctx.as('approver3'))('post', `/api/signoff/${windowId}/decision`).send(approve());
    expect([res.status, res.body.error.code]).toEqual([403, 'SELF_SIGNOFF']);
    const summary = await (await ctx.as('approver3'))('get', `/api/signoff/${windowId}`);
    expect(summary.body.me).toEqual({ decided: false, blocked: 'self' });
  }
});

test('a comment is required for approving and for sending back; one decision per approver per round', async () => {
  const { windowId } = await insertPlannedWindow(ctx, { key: 'comment', critical: true });
  await submit(windowId);
  const approver = await ctx.as('approver');
  for (const body of [{ decision: 'approve' }, { decision: 'approve', comment: '   ' }, { decision: 'send-back', comment: '' }]) {
    const res = await approver('post', `/api/signoff/${windowId}/decision`).send(body);
    expect([res.status, res.body.error.code]).toEqual([400, 'VALIDATION_FAILED']);
  }
  expect((await approver('post', `/api/signoff/${windowId}/decision`).send(approve())).status).toBe(200);
  const again = await approver('post', `/api/signoff/${windowId}/decision`).send(approve('Once more'));
  expect([again.status, again.body.error.code]).toEqual([409, 'ALREADY_DECIDED']);
  const count = await ctx.pool.query('select count(*)::int as n from signoffs where window_id = $1', [windowId]);
  expect(count.rows[0].n).toBe(1);
});

test('roles: only planners submit, only approvers decide, tenants get 404 on every sign-off route', async () => {
  const { windowId } = await insertPlannedWindow(ctx, { key: 'roles' });
  for (const role of ['engineer', 'approver', 'admin'] as const) {
    expect((await (await ctx.as(role))('post', `/api/windows/${windowId}/submit`).send({})).status).toBe(403);
  }
  const tenant = await ctx.as('tenant');
  expect((await tenant('post', `/api/windows/${windowId}/submit`).send({})).status).toBe(404);
  await submit(windowId);
  for (const role of ['engineer', 'planner', 'admin'] as const) {
    expect((await (await ctx.as(role))('post', `/api/signoff/${windowId}/decision`).send(approve())).status).toBe(403);
  }
  expect((await tenant('post', `/api/signoff/${windowId}/decision`).send(approve())).status).toBe(404);
  expect((await tenant('get', `/api/signoff/${windowId}`)).status).toBe(404);
  expect((await tenant('get', '/api/signoff/queue')).status).toBe(403);
  expect((await (await ctx.as('engineer'))('get', '/api/signoff/queue')).status).toBe(403);
  expect(await windowStatus(ctx, windowId)).toBe('in-review');
});

test('the summary and the queue: tenants and moving slices from the plan, unresolved slices, risks, links, decisions so far', async () => {
  const { windowId, planId, review } = await insertPlannedWindow(ctx, { key: 'summary', critical: true, unresolved: true, severity: 'critical' });
  await submit(windowId);
  const approver = await ctx.as('approver');
  await approver('post', `/api/signoff/${windowId}/decision`).send(approve('First look: fine.'));
  const res = await (await ctx.as('approver2'))('get', `/api/signoff/${windowId}`);
  expect(res.status).toBe(200);
  const s = res.body;
  expect(s.window).toMatchObject({ id: windowId, status: 'in-review', round: 1, workType: 'fibre splice', owner: { id: ctx.users.engineer.id } });
  expect(s.window.elements).toEqual([{ kind: 'site', id: `${ctx.prefix}-A`, name: 'Site A', effect: 'down', fraction: null }]);
  expect(s.plan).toMatchObject({ id: planId, href: `/windows/${windowId}/plans/${planId}`, acceptedBy: { id: ctx.users.planner.id } });
  // Own tenant: s1 moves, s3 stays, s4 unresolved; the other tenant: s2 moves.
  expect(s.tenants.map((t: { id: string; affected: number; moving: number }) => [t.id, t.affected, t.moving]).sort())
    .toEqual([[`${ctx.prefix}-other`, 1, 1], [ctx.tenantId, 3, 1]].sort());
  expect(s.totals).toEqual({ affected: 4, moving: 2, stays: 1, unresolved: 1, knockOn: 0 });
  expect(s.knockOn).toEqual([]);
  expect(s.unresolved).toEqual([expect.objectContaining({ slice: review.slices[3].slice, outageAccepted: true })]);
  expect(s.riskClass).toBe('high');
  expect(s.highestRisks[0]).toMatchObject({ slice: review.slices[0].slice, severity: 'critical' });
  expect(s.criticalSlices).toBe(1);
  expect(s.mop).toBeNull();
  expect([s.quorum, s.approvals, s.requireCode]).toEqual([2, 1, false]);
  expect(s.decisions).toEqual([expect.objectContaining({ round: 1, approver: { id: ctx.users.approver.id, name: `User ${ctx.users.approver.id}` }, decision: 'approve', comment: 'First look: fine.' })]);
  expect(s.me).toEqual({ decided: false, blocked: null });

  const queue = (await approver('get', '/api/signoff/queue')).body;
  const item = queue.windows.find((w: { windowId: string }) => w.windowId === windowId);
  expect(item).toMatchObject({ riskClass: 'high', critical: true, quorum: 2, approvals: 1, me: { decided: true, blocked: 'decided' } });
  const adminQueue = (await (await ctx.as('admin'))('get', '/api/signoff/queue')).body;
  expect(adminQueue.windows.find((w: { windowId: string }) => w.windowId === windowId).me.blocked).toBe('role');
});

test('the summary lists a knock-on move apart from the affected slices, with the names of the slices it makes room for', async () => {
  const { windowId, review } = await insertPlannedWindow(ctx, { key: 'knock', knockOn: true });
  await submit(windowId);
  const s = (await (await ctx.as('approver'))('get', `/api/signoff/${windowId}`)).body;
  const [, s2, , s5] = review.slices;
  expect(s.totals).toEqual({ affected: 3, moving: 2, stays: 1, unresolved: 0, knockOn: 1 });
  expect(s.tenants.find((t: { id: string }) => t.id === `${ctx.prefix}-other`)).toMatchObject({ affected: 1, moving: 1, knockOn: 1 });
  expect(s.knockOn).toEqual([{ slice: s5.slice, name: s5.name, tenantName: `${ctx.prefix} Other tenant`, outcome: 'move', madeRoomFor: ['Slice knock-s1'] }]);
  expect(s2.madeRoomFor).toEqual([]);
});
