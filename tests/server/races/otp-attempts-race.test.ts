// The wrong-code limit holds under parallel requests: of 20 wrong codes sent at once, at most OTP_MAX_FAILURES
// are checked (403, each audited) and the rest are refused unchecked (429 CODE_LOCKED) — for confirming an
// enrolment, for a sign-off decision and for removing a key.
import { decodeOtpKey, OTP_DRIFT_STEPS, otpCodeForStep, otpStepAt } from '../../../server/auth/otp';
import { OTP_MAX_FAILURES } from '../../../server/auth/otp-attempts';
import { insertPlannedWindow, setupSignoffApp, windowStatus, type SignoffTestContext } from '../signoff/helpers';

const NOW = new Date('2027-06-07T10:00:05Z');
const PARALLEL = 20;
let ctx: SignoffTestContext;

beforeAll(async () => { ctx = await setupSignoffApp('races_otp', NOW); });
afterAll(async () => {
  await ctx.cleanup();
  await ctx.close();
});

/** A 6-digit code that none of the accepted steps (now ± drift) produces for this key. */
function wrongCode(keyBase32: string): string {
  const step = otpStepAt(ctx.clock.now);
  const valid = new Set<string>();
  for (let s = step - OTP_DRIFT_STEPS; s <= step + OTP_DRIFT_STEPS; s++) valid.add(otpCodeForStep(decodeOtpKey(keyBase32), s));
  let n = 0;
  while (valid.has(String(n).padStart(6, '0'))) n++;
  return String(n).padStart(6, '0');
}

async function enrol(who: 'approver' | 'approver2' | 'approver3', confirm: boolean): Promise<string> {
  const as = await ctx.as(who);
  const { keyBase32 } = (await as('post', '/api/me/otp/enrol')).body;
  if (confirm) {
    const code = otpCodeForStep(decodeOtpKey(keyBase32), otpStepAt(ctx.clock.now));
    expect((await as('post', '/api/me/otp/confirm').send({ code })).status).toBe(200);
  }
  return keyBase32;
}

/** The answers' `status code` pairs, counted. */
function tally(answers: { status: number; body: { error?: { code: string } } }[]): Record<string, number> {
  const counts: Record<string, number> = {};
  for (const a of answers) {
    const key = `${a.status} ${a.body.error?.code ?? ''}`;
    counts[key] = (counts[key] ?? 0) + 1;
  }
  return counts;
}

async function failuresAudited(userId: string): Promise<number> {
  const res = await ctx.pool.query(`select count(*)::int as n from audit_log where action = 'otp.code-failed' and entity_id = $1`, [userId]);
  return res.rows[0].n;
}

test('20 parallel wrong codes confirming an enrolment: 5 are checked, 15 are refused as CODE_LOCKED', async () => {
  const key = await enrol('approver3', false);
  const as = await ctx.as('approver3');
  const code = wrongCode(key);
  const answers = await Promise.all(Array.from({ length: PARALLEL }, () => as('post', '/api/me/otp/confirm').send({ code })));
  expect(tally(answers)).toEqual({ '403 CODE_INVALID': OTP_MAX_FAILURES, '429 CODE_LOCKED': PARALLEL - OTP_MAX_FAILURES });
  expect(await failuresAudited(ctx.userId('approver3'))).toBe(OTP_MAX_FAILURES);
  expect((await as('get', '/api/me/otp')).body.enrolled).toBe(false);
});

test('20 parallel decisions with wrong codes: 5 are checked, none is recorded, the window stays in review', async () => {
  const key = await enrol('approver', true);
  const { windowId } = await insertPlannedWindow(ctx, { key: 'race' });
  expect((await (await ctx.as('planner'))('post', `/api/windows/${windowId}/submit`).send({})).status).toBe(200);
  const as = await ctx.as('approver');
  const body = { decision: 'send-back', comment: 'Parallel wrong codes.', code: wrongCode(key) };
  const answers = await Promise.all(Array.from({ length: PARALLEL }, () => as('post', `/api/signoff/${windowId}/decision`).send(body)));
  expect(tally(answers)).toEqual({ '403 CODE_INVALID': OTP_MAX_FAILURES, '429 CODE_LOCKED': PARALLEL - OTP_MAX_FAILURES });
  expect(await failuresAudited(ctx.userId('approver'))).toBe(OTP_MAX_FAILURES);
  expect((await ctx.pool.query('select 1 from signoffs where window_id = $1', [windowId])).rowCount).toBe(0);
  expect(await windowStatus(ctx, windowId)).toBe('in-review');
});

test('20 parallel key removals with wrong codes: 5 are checked and the key stays', async () => {
  const key = await enrol('approver2', true);
  const as = await ctx.as('approver2');
  const code = wrongCode(key);
  const answers = await Promise.all(Array.from({ length: PARALLEL }, () => as('delete', '/api/me/otp').send({ code })));
  expect(tally(answers)).toEqual({ '403 CODE_INVALID': OTP_MAX_FAILURES, '429 CODE_LOCKED': PARALLEL - OTP_MAX_FAILURES });
  expect(await failuresAudited(ctx.userId('approver2'))).toBe(OTP_MAX_FAILURES);
  expect((await as('get', '/api/me/otp')).body.enrolled).toBe(true);
});
