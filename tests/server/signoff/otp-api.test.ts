// One-time codes through the API: enrolment (URI, key, QR code), confirmation, and decisions under the code policy —
// a missing, wrong or replayed code is refused and a valid one is recorded as confirmed.
import { decodeOtpKey, otpCodeForStep, otpStepAt } from '../../../server/auth/otp';
import { insertPlannedWindow, setupSignoffApp, windowStatus, type SignoffTestContext } from './helpers';

const NOW = new Date('2027-06-07T10:00:05Z');
let ctx: SignoffTestContext;

beforeAll(async () => { ctx = await setupSignoffApp('otp', NOW); });
afterAll(async () => {
  await ctx.cleanup();
  await ctx.close();
});

const codeAt = (keyBase32: string, at: Date) => otpCodeForStep(decodeOtpKey(keyBase32), otpStepAt(at));
const later = (seconds: number) => { ctx.clock.now = new Date(ctx.clock.now.getTime() + seconds * 1000); };

async function enrolAndConfirm(who: 'approver' | 'approver2'): Promise<string> {
  const as = await ctx.as(who);
  const enrol = await as('post', '/api/me/otp/enrol');
  expect(enrol.status).toBe(201);
  const { keyBase32 } = enrol.body;
  expect((await as('post', '/api/me/otp/confirm').send({ code: codeAt(keyBase32, ctx.clock.now) })).status).toBe(200);
  return keyBase32;
}

test('enrolment gives an otpauth URI, the key as base32 and an SVG QR code; a wrong first code does not confirm it', async () => {
  const approver = await ctx.as('approver3');
  const res = await approver('post', '/api/me/otp/enrol');
  expect(res.status).toBe(201);
  expect(res.body.keyBase32).toMatch(/^[A-Z2-7]{32}$/);
  expect(res.body.uri).toMatch(/^otpauth:\/\/totp\/Slackwater:/);
  expect(new URL(res.body.uri).searchParams.get('secret')).toBe(res.body.keyBase32);
  expect(res.body.qrSvg).toMatch(/^<svg[\s\S]*<\/svg>\s*$/);
  expect((await approver('get', '/api/me/otp')).body).toEqual({ enrolled: false, confirmedAt: null });
  const right = codeAt(res.body.keyBase32, ctx.clock.now);
  const wrong = right === '000000' ? '000001' : '000000';
  expect((await approver('post', '/api/me/otp/confirm').send({ code: wrong })).body.error.code).toBe('CODE_INVALID');
  const ok = await approver('post', '/api/me/otp/confirm').send({ code: right });
  expect(ok.body).toEqual({ enrolled: true, confirmedAt: ctx.clock.now.toISOString() });
  expect((await approver('post', '/api/me/otp/enrol')).body.error.code).toBe('OTP_ALREADY_ENROLLED');
  // Removing a confirmed key takes a current code (the confirming one is spent, so wait a step).
  expect((await approver('delete', '/api/me/otp').send({})).status).toBe(400);
  later(30);
  expect((await approver('delete', '/api/me/otp').send({ code: codeAt(res.body.keyBase32, ctx.clock.now) })).status).toBe(204);
  expect((await approver('get', '/api/me/otp')).body.enrolled).toBe(false);
});

test('tenants cannot enrol', async () => {
  expect((await (await ctx.as('tenant'))('post', '/api/me/otp/enrol')).status).toBe(403);
});

test('with the code policy on, a decision needs a valid, unused code; the decision records that it was confirmed', async () => {
  const admin = await ctx.as('admin');
  expect((await admin('patch', '/api/policies').send({ signoffRequireCode: true, signoffQuorumHigh: 2 })).status).toBe(200);
  const key = await enrolAndConfirm('approver');
  const key2 = await enrolAndConfirm('approver2');
  const { windowId } = await insertPlannedWindow(ctx, { key: 'coded', unresolved: true });
  expect((await (await ctx.as('planner'))('post', `/api/windows/${windowId}/submit`).send({})).status).toBe(200);
  const approver = await ctx.as('approver');
  const decide = (code?: string) => approver('post', `/api/signoff/${windowId}/decision`).send({ decision: 'approve', comment: 'Outage of one slice accepted by its tenant.', code });

  expect((await approver('get', `/api/signoff/${windowId}`)).body).toMatchObject({ requireCode: true, riskClass: 'high', quorum: 2 });
  const missing = await decide();
  expect([missing.status, missing.body.error.code]).toEqual([400, 'CODE_REQUIRED']);
  // The code that confirmed the enrolment belongs to this very step: using it again is a replay.
  const replay = await decide(codeAt(key, ctx.clock.now));
  expect([replay.status, replay.body.error.code]).toEqual([403, 'CODE_REPLAYED']);
  const right = codeAt(key, new Date(ctx.clock.now.getTime() + 30_000));
  const wrong = String((Number(right) + 1) % 1_000_000).padStart(6, '0');
  const bad = await decide(wrong);
  expect([bad.status, bad.body.error.code]).toEqual([403, 'CODE_INVALID']);
  expect((await ctx.pool.query('select count(*)::int as n from signoffs where window_id = $1', [windowId])).rows[0].n).toBe(0);

  later(30);
  const ok = await decide(right);
  expect(ok.status).toBe(200);
  expect(ok.body).toMatchObject({ status: 'in-review', approvals: 1, quorum: 2 });
  const row = (await ctx.pool.query('select code_confirmed, comment from signoffs where window_id = $1', [windowId])).rows[0];
  expect(row).toEqual({ code_confirmed: true, comment: 'Outage of one slice accepted by its tenant.' });

  // A second approver's own code clears it; their enrolment code was spent 30 s ago, the current one is fresh.
  const second = await (await ctx.as('approver2'))('post', `/api/signoff/${windowId}/decision`)
    .send({ decision: 'approve', comment: 'Agreed.', code: codeAt(key2, ctx.clock.now) });
  expect(second.body).toMatchObject({ approvals: 2, quorum: 2 });
  expect(['cleared', 'notified']).toContain(await windowStatus(ctx, windowId));
  const audit = await ctx.pool.query(`select after from audit_log where entity_id = $1 and action = 'signoff.decision' order by id`, [windowId]);
  expect(audit.rows.map((r) => r.after.codeConfirmed)).toEqual([true, true]);
});

test('an approver without confirmed codes is told to enrol when the policy is on; an admin can reset a key', async () => {
  const { windowId } = await insertPlannedWindow(ctx, { key: 'noenrol' });
  expect((await (await ctx.as('planner'))('post', `/api/windows/${windowId}/submit`).send({})).status).toBe(200);
  const res = await (await ctx.as('approver3'))('post', `/api/signoff/${windowId}/decision`).send({ decision: 'approve', comment: 'Fine.', code: '123456' });
  expect([res.status, res.body.error.code]).toEqual([403, 'OTP_NOT_ENROLLED']);
  const admin = await ctx.as('admin');
  expect((await (await ctx.as('planner'))('delete', `/api/signoff/otp-keys/${ctx.users.approver.id}`)).status).toBe(403);
  expect((await admin('delete', `/api/signoff/otp-keys/${ctx.users.approver.id}`)).status).toBe(204);
  expect((await (await ctx.as('approver'))('get', '/api/me/otp')).body.enrolled).toBe(false);
  const audit = await ctx.pool.query(`select actor_id from audit_log where action = 'otp.remove' and entity_id = $1`, [ctx.users.approver.id]);
  expect(audit.rows.map((r) => r.actor_id)).toContain(ctx.users.admin.id);
});

test('wrong codes are audited, and after five within 15 minutes even a right code is refused until the window passes', async () => {
  later(16 * 60); // clear earlier tests' failures for this user
  const approver = await ctx.as('approver3');
  const enrol = await approver('post', '/api/me/otp/enrol');
  expect(enrol.status).toBe(201);
  const right = () => codeAt(enrol.body.keyBase32, ctx.clock.now);
  const wrong = () => String((Number(right()) + 500_000) % 1_000_000).padStart(6, '0');
  for (let i = 0; i < 5; i += 1) {
    const res = await approver('post', '/api/me/otp/confirm').send({ code: wrong() });
    expect([res.status, res.body.error.code]).toEqual([403, 'CODE_INVALID']);
  }
  const locked = await approver('post', '/api/me/otp/confirm').send({ code: right() });
  expect([locked.status, locked.body.error.code]).toEqual([429, 'CODE_LOCKED']);
  const audited = await ctx.pool.query(
    "select count(*)::int as n from audit_log where action = 'otp.code-failed' and entity_id = $1 and at > $2",
    [`${ctx.prefix}-approver3`, new Date(ctx.clock.now.getTime() - 15 * 60_000)],
  );
  expect(audited.rows[0].n).toBe(5);
  later(15 * 60 + 1);
  expect((await approver('post', '/api/me/otp/confirm').send({ code: right() })).status).toBe(200);
});
