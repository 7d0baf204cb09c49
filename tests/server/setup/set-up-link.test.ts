// Starting without the demo: setup creates only the admin asked for, or prints a one-time set-up link that makes the
// first admin once (then never again), and refuses wrong settings with a message naming the variable.
import { verify } from '@node-rs/argon2';
import request from 'supertest';
import { createApp } from '../../../server/app';
import { parseSetupEnv, SetupEnvError } from '../../../db/setup-env';
import { runSetup, SET_UP_LINK_VALID_SECONDS } from '../../../db/setup-run';
import { countSeededRows } from '../../../db/queries/count-seeded-rows';
import { signInResponseSchema } from '../../../shared/api';
import { siteListSchema } from '../../../shared/inventory-lists';
import { createScratchDb, type TestDb } from '../../db/helpers';
import { sessionCookieFrom, testConfig } from '../helpers/test-app';

let t: TestDb;
const NOW = new Date('2031-03-02T09:00:00Z');
const HOUR_MS = 3_600_000;
const ADMIN = { ADMIN_EMAIL: 'ops.lead@operator.example', ADMIN_PASSWORD: 'correct horse battery' };
const FORM = { name: 'Ada Quay', email: 'ada.quay@operator.example', password: 'long enough password' };
const noDemo = () => { throw new Error('the demo must not be read with SEED_DEMO=false'); };

beforeAll(async () => {
  t = await createScratchDb('setup_link');
}, 60_000);
afterAll(() => t?.close());
beforeEach(async () => {
  await t.pool.query('truncate users, one_time_links, sign_in_failures, audit_log, sites, tenants cascade');
});

function appAt(now: Date, limit = { windowMs: 60_000, perAccount: 1000, perAddress: 1000 }) {
  return createApp({ db: t.db, config: testConfig({ DATABASE_URL: t.url }), now: () => now, signInLimit: limit });
}

async function setup(env: Record<string, string>, now = NOW) {
  const lines: string[] = [];
  const outcome = await runSetup(t.db, parseSetupEnv(env), { now, demoScenario: noDemo, log: (l) => lines.push(l) });
  return { outcome, lines };
}

describe('db setup with SEED_DEMO=false', () => {
  test('with ADMIN_EMAIL and ADMIN_PASSWORD: no network, no demo accounts, one argon2id admin who can sign in', async () => {
    const { outcome, lines } = await setup({ SEED_DEMO: 'false', ...ADMIN });
    expect(outcome).toMatchObject({ seeded: null, admin: 'created', setUpToken: null });
    const counts = await countSeededRows(t.db);
    expect(counts).toMatchObject({ sites: 0, spans: 0, tenants: 0, slices: 0, windows: 0, users: 1, roleGrants: 1 });
    const { rows } = await t.pool.query('select u.name, c.password_hash, r.role from users u join password_credentials c on c.user_id = u.id join role_grants r on r.user_id = u.id');
    expect(rows[0]).toMatchObject({ name: 'ops.lead', role: 'admin' });
    expect(rows[0].password_hash).toMatch(/^\$argon2id\$/);
    expect(lines.join('\n')).not.toMatch(/set-up\?token=/);
    const res = await request(appAt(NOW)).post('/api/auth/sign-in').send({ email: ADMIN.ADMIN_EMAIL, password: ADMIN.ADMIN_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.user.roles).toEqual(['admin']);
    const sites = await request(appAt(NOW)).get('/api/sites').set('Cookie', sessionCookieFrom(res));
    expect(sites.status).toBe(200);
    expect(siteListSchema.parse(sites.body)).toMatchObject({ items: [], total: 0 });
  });

  test('a second start with another ADMIN_PASSWORD keeps the account and its password, and says so', async () => {
    await setup({ SEED_DEMO: 'false', ...ADMIN });
    const { outcome, lines } = await setup({ SEED_DEMO: 'false', ...ADMIN, ADMIN_PASSWORD: 'a different password' });
    expect(outcome.admin).toBe('exists');
    expect(lines.join('\n')).toMatch(/already exists; ADMIN_PASSWORD was not applied/);
    const { rows } = await t.pool.query('select password_hash from password_credentials');
    expect(rows).toHaveLength(1);
    expect(await verify(rows[0].password_hash, ADMIN.ADMIN_PASSWORD)).toBe(true);
  });

  test('ADMIN_NAME names the admin', async () => {
    await setup({ SEED_DEMO: 'false', ...ADMIN, ADMIN_NAME: 'Ops Lead' });
    expect((await t.pool.query('select name from users')).rows).toEqual([{ name: 'Ops Lead' }]);
  });

  test('without an admin asked for, it prints a set-up link on the asked port and creates no account', async () => {
    const { outcome, lines } = await setup({ SEED_DEMO: 'false', PORT: '8091' });
    expect(outcome.setUpToken).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(lines).toContain(`setup: open http://127.0.0.1:8091/set-up?token=${outcome.setUpToken} to create the first admin (valid 24 h, once)`);
    expect((await countSeededRows(t.db)).users).toBe(0);
    const { rows } = await t.pool.query('select token_hash, kind, expires_at from one_time_links');
    expect(rows).toHaveLength(1);
    expect(rows[0].token_hash).not.toContain(outcome.setUpToken);
    expect(rows[0].expires_at.getTime() - NOW.getTime()).toBe(SET_UP_LINK_VALID_SECONDS * 1000);
  });
});

describe('settings setup refuses', () => {
  test.each([
    [{ ADMIN_EMAIL: 'a@b.example' }, /ADMIN_PASSWORD is not set/],
    [{ ADMIN_PASSWORD: 'long enough password' }, /ADMIN_EMAIL is not set/],
    [{ ADMIN_EMAIL: 'not-an-address', ADMIN_PASSWORD: 'long enough password' }, /ADMIN_EMAIL: Enter a valid e-mail/],
    [{ ADMIN_EMAIL: 'a@b.example', ADMIN_PASSWORD: 'short' }, /ADMIN_PASSWORD: Use at least 12 characters/],
    [{ SEED_DEMO: 'maybe' }, /SEED_DEMO is "maybe"/],
  ])('%o', (env, message) => {
    expect(() => parseSetupEnv(env)).toThrow(SetupEnvError);
    expect(() => parseSetupEnv(env)).toThrow(message);
  });

  test('SEED_DEMO is on unless set to false', () => {
    expect(parseSetupEnv({}).seedDemo).toBe(true);
    expect(parseSetupEnv({ SEED_DEMO: 'FALSE' }).seedDemo).toBe(false);
  });
});

describe('the set-up link', () => {
  test('works once: it creates an admin, signs them in, and then answers like an unknown link', async () => {
    const { outcome } = await setup({ SEED_DEMO: 'false' });
    const token = outcome.setUpToken!;
    const app = appAt(new Date(NOW.getTime() + HOUR_MS));
    expect((await request(app).get(`/api/set-up/${token}`)).body).toEqual({ valid: true });
    const res = await request(app).post('/api/set-up').send({ ...FORM, token });
    expect(res.status).toBe(201);
    expect(signInResponseSchema.parse(res.body).user).toMatchObject({ email: FORM.email, name: FORM.name, roles: ['admin'] });
    const me = await request(app).get('/api/me').set('Cookie', sessionCookieFrom(res));
    expect(me.body).toMatchObject({ email: FORM.email, roles: ['admin'] });
    const again = await request(app).get(`/api/set-up/${token}`);
    expect(again.status).toBe(404);
    expect(again.body.error.code).toBe('SETUP_LINK_INVALID');
    const audit = await t.pool.query("select actor_id from audit_log where action = 'set-up.first-admin'");
    expect(audit.rows).toEqual([{ actor_id: res.body.user.id }]);
  });

  test('once any admin exists, a set-up is refused with 409 and nothing is written', async () => {
    const { outcome } = await setup({ SEED_DEMO: 'false' });
    await setup({ SEED_DEMO: 'false', ...ADMIN });
    const res = await request(appAt(NOW)).post('/api/set-up').send({ ...FORM, token: outcome.setUpToken });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('ALREADY_SET_UP');
    expect((await t.pool.query('select email from users')).rows).toEqual([{ email: ADMIN.ADMIN_EMAIL }]);
  });

  test('after 24 hours it no longer works', async () => {
    const { outcome } = await setup({ SEED_DEMO: 'false' });
    const late = appAt(new Date(NOW.getTime() + 24 * HOUR_MS + 1000));
    expect((await request(late).get(`/api/set-up/${outcome.setUpToken}`)).status).toBe(404);
    const res = await request(late).post('/api/set-up').send({ ...FORM, token: outcome.setUpToken });
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('SETUP_LINK_INVALID');
    expect((await countSeededRows(t.db)).users).toBe(0);
  });

  test('a wrong or malformed token gets the same 404; a new start replaces the unused old link', async () => {
    const first = (await setup({ SEED_DEMO: 'false' })).outcome.setUpToken!;
    const second = (await setup({ SEED_DEMO: 'false' })).outcome.setUpToken!;
    const app = appAt(NOW);
    for (const token of [first, 'A'.repeat(43), 'short']) {
      const res = await request(app).get(`/api/set-up/${token}`);
      expect([res.status, res.body.error?.code]).toEqual([404, 'SETUP_LINK_INVALID']);
    }
    expect((await request(app).get(`/api/set-up/${second}`)).status).toBe(200);
  });

  test('the form is checked: a short password is refused before anything is written', async () => {
    const { outcome } = await setup({ SEED_DEMO: 'false' });
    const res = await request(appAt(NOW)).post('/api/set-up').send({ ...FORM, password: 'too short', token: outcome.setUpToken });
    expect(res.status).toBe(400);
    expect((await countSeededRows(t.db)).users).toBe(0);
  });

  test('a cross-site POST is refused by the Origin check', async () => {
    const { outcome } = await setup({ SEED_DEMO: 'false' });
    const res = await request(appAt(NOW)).post('/api/set-up').set('Origin', 'https://elsewhere.example').send({ ...FORM, token: outcome.setUpToken });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('BAD_ORIGIN');
  });

  test('guessing links is limited per address like sign-in', async () => {
    const app = appAt(NOW, { windowMs: 60_000, perAccount: 1000, perAddress: 2 });
    const answers = [];
    for (let i = 0; i < 3; i++) answers.push(await request(app).get(`/api/set-up/${'B'.repeat(43)}`));
    expect(answers.map((a) => a.status)).toEqual([404, 404, 429]);
    // Worded for links, not for a sign-in that never happened.
    expect(answers[2].body.error.message).toMatch(/^Too many links that did not work were opened from your network address\. Try again in 1 minute\.$/);
  });
});
