// One approver's side of sign-off: the waiting count behind the tab badge, "Decided by me", and the policy
// check that a high-risk quorum is never below the low-risk one.
import { lockPolicies, POLICIES_LOCK_KEY, upsertPolicies } from '../../../server/queries/windows/policies';
import { waitFor } from '../mail/test-boss';
import { insertPlannedWindow, setupSignoffApp, type SignoffTestContext } from './helpers';

const NOW = new Date('2027-06-07T09:00:00Z');
let ctx: SignoffTestContext;

beforeAll(async () => { ctx = await setupSignoffApp('mine', NOW); });
afterAll(async () => {
  await ctx.cleanup();
  await ctx.close();
});

async function submit(windowId: string) {
  expect((await (await ctx.as('planner'))('post', `/api/windows/${windowId}/submit`).send({})).status).toBe(200);
}

async function waiting(who: Parameters<SignoffTestContext['as']>[0]): Promise<number> {
  const res = await (await ctx.as(who))('get', '/api/signoff/waiting-count');
  expect(res.status).toBe(200);
  return res.body.waiting;
}

test('the waiting count holds windows in review not yet decided by me and not my own work; it drops when I decide', async () => {
  // The scratch database outlives a run, so the counts are read as changes from where they start.
  const [base2, base3] = [await waiting('approver2'), await waiting('approver3')];
  const a = await insertPlannedWindow(ctx, { key: 'wait-a' });
  const own = await insertPlannedWindow(ctx, { key: 'wait-own', acceptedBy: ctx.userId('approver2') });
  // Planned but never submitted: not in review, so it waits for nobody.
  await insertPlannedWindow(ctx, { key: 'wait-planned' });
  await submit(a.windowId);
  await submit(own.windowId);
  expect(await waiting('approver2')).toBe(base2 + 1);
  expect(await waiting('approver3')).toBe(base3 + 2);
  const decided = await (await ctx.as('approver2'))('post', `/api/signoff/${a.windowId}/decision`).send({ decision: 'send-back', comment: 'Move it to the weekend.' });
  expect(decided.status).toBe(200);
  expect(await waiting('approver2')).toBe(base2);
  // Sent back, the window has left review for everyone.
  expect(await waiting('approver3')).toBe(base3 + 1);
});

test('the waiting count: admins read 0, other staff and tenants are refused', async () => {
  expect(await waiting('admin')).toBe(0);
  expect((await (await ctx.as('planner'))('get', '/api/signoff/waiting-count')).status).toBe(403);
  expect((await (await ctx.as('tenant'))('get', '/api/signoff/waiting-count')).status).toBe(403);
});

test('"Decided by me" lists my decisions with the window as it is now, and nobody else\'s', async () => {
  const { windowId } = await insertPlannedWindow(ctx, { key: 'mine-a' });
  await submit(windowId);
  const res = await (await ctx.as('approver3'))('post', `/api/signoff/${windowId}/decision`).send({ decision: 'approve', comment: 'Ring has the headroom.' });
  expect(res.status).toBe(200);
  const mine = await (await ctx.as('approver3'))('get', '/api/signoff/decided-by-me');
  expect(mine.status).toBe(200);
  expect(mine.body.decisions[0]).toMatchObject({
    windowId, title: `${ctx.prefix} window mine-a`, round: 1, currentRound: 1, decision: 'approve',
    comment: 'Ring has the headroom.', codeConfirmed: false, decidedAt: NOW.toISOString(),
  });
  expect(['cleared', 'notified']).toContain(mine.body.decisions[0].windowStatus);
  const others = await (await ctx.as('approver2'))('get', '/api/signoff/decided-by-me');
  expect(others.body.decisions.map((d: { windowId: string }) => d.windowId)).not.toContain(windowId);
  expect((await (await ctx.as('admin'))('get', '/api/signoff/decided-by-me')).status).toBe(403);
});

test('a high-risk quorum below the low-risk one is refused naming both values, and nothing changes', async () => {
  const admin = await ctx.as('admin');
  const before = (await admin('get', '/api/policies')).body.policies;
  const audits = async () => Number((await ctx.pool.query(`select count(*) from audit_log where action = 'policy.update'`)).rows[0].count);
  const auditsBefore = await audits();
  const both = await admin('patch', '/api/policies').send({ signoffQuorumLow: 3, signoffQuorumHigh: 2 });
  expect(both.status).toBe(400);
  expect(both.body.error.code).toBe('QUORUM_ORDER');
  expect(both.body.error.message).toMatch(/High-risk plans would need 2 approvals, fewer than the 3 low-risk/);
  // Only the low one in the patch: checked against the stored high one.
  const lowOnly = await admin('patch', '/api/policies').send({ signoffQuorumLow: before.signoffQuorumHigh + 1 });
  expect(lowOnly.body.error.code).toBe('QUORUM_ORDER');
  expect((await admin('get', '/api/policies')).body.policies).toEqual(before);
  expect(await audits()).toBe(auditsBefore);
  // Equal is allowed.
  const equal = await admin('patch', '/api/policies').send({ signoffQuorumLow: 2, signoffQuorumHigh: 2 });
  expect(equal.status).toBe(200);
  expect(equal.body.policies).toMatchObject({ signoffQuorumLow: 2, signoffQuorumHigh: 2 });
  await admin('patch', '/api/policies').send({ signoffQuorumLow: before.signoffQuorumLow, signoffQuorumHigh: before.signoffQuorumHigh });
});

test('two quorum changes at once cannot together leave the high-risk quorum below the low-risk one', async () => {
  const admin = await ctx.as('admin');
  const before = (await admin('get', '/api/policies')).body.policies;
  expect(await admin('patch', '/api/policies').send({ signoffQuorumLow: 2, signoffQuorumHigh: 3 })).toHaveProperty('status', 200);
  // Another admin's change is mid-flight: it holds the policy lock and has raised the low-risk quorum to 3,
  // not yet committed. This admin's request lowers the high-risk quorum to 2 and must wait for it, then
  // judge against the committed 3; without the lock it would read the old 2, pass, and leave high < low.
  let answer: Promise<{ status: number; body: { error?: { code: string } } }> | undefined;
  await ctx.db.transaction(async (tx) => {
    await lockPolicies(tx);
    await upsertPolicies(tx, { signoffQuorumLow: 3 }, ctx.users.admin.id, NOW);
    const request = admin('patch', '/api/policies').send({ signoffQuorumHigh: 2 });
    answer = request.then((res) => res);
    let settled = false;
    void answer.then(() => { settled = true; });
    // Waits until the request is queued behind the lock (or has answered already, which the assertions catch).
    const waiters = async () => (await ctx.pool.query(
      `select count(*)::int as n from pg_locks where locktype = 'advisory' and not granted and objid = $1
         and database = (select oid from pg_database where datname = current_database())`, [POLICIES_LOCK_KEY])).rows[0].n as number;
    await waitFor(waiters, (n) => settled || n > 0);
  });
  const res = await answer!;
  expect(res.status).toBe(400);
  expect(res.body.error?.code).toBe('QUORUM_ORDER');
  expect((await admin('get', '/api/policies')).body.policies).toMatchObject({ signoffQuorumLow: 3, signoffQuorumHigh: 3 });
  await admin('patch', '/api/policies').send({ signoffQuorumLow: before.signoffQuorumLow, signoffQuorumHigh: before.signoffQuorumHigh });
});
