// /api/policies: defaults for staff, admin-only changes with an audit row; tenants cannot read them.
import { POLICY_DEFAULTS } from '../../../shared/policies';
import { setupWindowsApp, type WindowsContext } from './helpers/windows-app';

const NOW = new Date('2027-03-01T08:00:00Z');
let ctx: WindowsContext;

beforeAll(async () => { ctx = await setupWindowsApp(NOW); });
afterAll(async () => {
  await ctx.cleanup();
  await ctx.close();
});

test('staff read the policies (defaults where none was set); tenants may not', async () => {
  const res = await (await ctx.as('engineer'))('get', '/api/policies');
  expect(res.status).toBe(200);
  expect(res.body.policies.maxWindowHours).toBe(POLICY_DEFAULTS.maxWindowHours);
  expect((await (await ctx.as('tenant'))('get', '/api/policies')).status).toBe(403);
});

test('only an admin changes a policy; bad values and unknown keys are refused; the change is audited', async () => {
  expect((await (await ctx.as('planner'))('patch', '/api/policies').send({ noticeLeadDays: 9 })).status).toBe(403);
  const admin = await ctx.as('admin');
  expect((await admin('patch', '/api/policies').send({ maxWindowHours: -1 })).body.error.code).toBe('VALIDATION_FAILED');
  expect((await admin('patch', '/api/policies').send({ colour: 'blue' })).body.error.code).toBe('VALIDATION_FAILED');
  // noticeLeadDays: no other test depends on it, so changing it here cannot disturb a parallel file.
  const before = (await admin('get', '/api/policies')).body.policies.noticeLeadDays;
  const res = await admin('patch', '/api/policies').send({ noticeLeadDays: before + 2 });
  expect(res.body.policies.noticeLeadDays).toBe(before + 2);
  const audit = await ctx.pool.query(`select before, after from audit_log where actor_id = $1 and action = 'policy.update'`, [ctx.users.admin.id]);
  expect(audit.rows).toHaveLength(1);
  expect([audit.rows[0].before.noticeLeadDays, audit.rows[0].after.noticeLeadDays]).toEqual([before, before + 2]);
  await admin('patch', '/api/policies').send({ noticeLeadDays: before });
});
