// The first-admin set-up form is held to the password policy: a weak or own-name password is refused with the
// estimator's feedback, the link keeps working and no account is made.
import request from 'supertest';
import { countSeededRows } from '../../db/queries/count-seeded-rows';
import { parseSetupEnv } from '../../db/setup-env';
import { runSetup } from '../../db/setup-run';
import { createApp } from '../../server/app';
import { createScratchDb, type TestDb } from '../db/helpers';
import { testConfig } from './helpers/test-app';

let t: TestDb;
const NOW = new Date('2031-03-02T09:00:00Z');
const FORM = { name: 'Ada Quay', email: 'ada.quay@operator.example' };

beforeAll(async () => {
  t = await createScratchDb('passwords_setup');
}, 60_000);
afterAll(() => t?.close());

test.each([
  ['common', 'password1234', /commonly used/],
  ['built from the admin\'s own name', 'Ada Quay operator', /your own name or e-mail address/],
])('a %s password is refused; the link still works', async (_kind, password, feedback) => {
  await t.pool.query('truncate users, one_time_links, sign_in_failures, audit_log cascade');
  const outcome = await runSetup(t.db, parseSetupEnv({ SEED_DEMO: 'false' }), { now: NOW, demoScenario: () => null, log: () => undefined });
  const app = createApp({ db: t.db, config: testConfig({ DATABASE_URL: t.url }), now: () => NOW, signInLimit: { windowMs: 60_000, perAccount: 1000, perAddress: 1000 } });
  const res = await request(app).post('/api/set-up').send({ ...FORM, password, token: outcome.setUpToken });
  expect([res.status, res.body.error.code]).toEqual([400, 'WEAK_PASSWORD']);
  expect(res.body.error.message).toMatch(feedback);
  expect((await countSeededRows(t.db)).users).toBe(0);
  expect((await request(app).get(`/api/set-up/${outcome.setUpToken}`)).status).toBe(200);
});
