// The admin's single sign-on settings: who may read and write them, the secret that is never sent back, the
// checks on the mapping, and password sign-in for staff turned off only once an admin can get in through SSO.
import { eq, inArray } from 'drizzle-orm';
import request from 'supertest';
import { auditLog, roleGrants, users } from '../../../db/schema';
import { signInAs } from '../helpers/sign-in';
import { TEST_PASSWORD } from '../helpers/test-app';
import { TEST_CLIENT_SECRET } from './local-issuer';
import { person, setupSso, ssoSignIn, type SsoContext } from './sso-fixture';

let ctx: SsoContext;
beforeAll(async () => {
  ctx = await setupSso('sso_settings', (p) => [person('ines', p, ['slackwater-admins'])]);
}, 60_000);
afterAll(() => ctx.close());

const asAdmin = (method: 'get' | 'put') => request(ctx.app)[method]('/api/sso').set('Cookie', ctx.adminCookie);
const passwordSignIn = (email: string) => request(ctx.app).post('/api/auth/sign-in').send({ email, password: TEST_PASSWORD });

test('the secret is stored but never sent back: the answers and the audit rows say only that it is set', async () => {
  const read = await asAdmin('get');
  expect(read.status).toBe(200);
  expect(read.body).toMatchObject({ configured: true, clientSecretSet: true, displayName: 'Harbourline staff login' });
  expect(read.body.redirectUri).toBe(`${ctx.config.publicUrl}/api/auth/sso/callback`);
  // Saved again without a secret: the stored one stays (and still works for sign-in below).
  const saved = await asAdmin('put').send({ ...ctx.settings, clientSecret: undefined, displayName: 'Harbourline login' });
  expect([saved.status, saved.body.clientSecretSet, saved.body.displayName]).toEqual([200, true, 'Harbourline login']);
  const rows = await ctx.db.select().from(auditLog).where(eq(auditLog.action, 'sso-settings-changed'));
  expect(rows.length).toBeGreaterThanOrEqual(2);
  for (const text of [JSON.stringify(read.body), JSON.stringify(saved.body), JSON.stringify(rows)]) expect(text).not.toContain(TEST_CLIENT_SECRET);
});

test('who may: admins read and write; other staff get 403; tenants do not learn the route exists', async () => {
  const engineer = await signInAs(ctx.app, ctx.users.engineer.email);
  const tenant = await signInAs(ctx.app, ctx.users.tenant.email);
  const statuses = [
    (await request(ctx.app).get('/api/sso').set('Cookie', engineer)).status,
    (await request(ctx.app).put('/api/sso').set('Cookie', engineer).send(ctx.settings)).status,
    (await request(ctx.app).get('/api/sso').set('Cookie', tenant)).status,
    (await request(ctx.app).get('/api/sso')).status,
  ];
  expect(statuses).toEqual([403, 403, 404, 401]);
});

test.each([
  ['a tenant role in the mapping', { groupRoles: [{ group: 'outsiders', roles: ['tenant'] }] }],
  ['a group twice', { groupRoles: [{ group: 'g', roles: ['admin'] }, { group: 'g', roles: ['planner'] }] }],
  ['a group without roles', { groupRoles: [{ group: 'g', roles: [] }] }],
  ['an issuer that is not a web address', { issuerUrl: 'not an address' }],
])('%s: 400, settings unchanged', async (_name, patch) => {
  const before = (await asAdmin('get')).body;
  const res = await asAdmin('put').send({ ...ctx.settings, ...patch });
  expect([res.status, res.body.error?.code]).toEqual([400, 'VALIDATION_FAILED']);
  expect((await asAdmin('get')).body).toEqual(before);
});

test('the sign-in screen reads the button words without a session', async () => {
  const res = await request(ctx.app).get('/api/auth/sso/button');
  expect(res.body).toEqual({ enabled: true, displayName: (await asAdmin('get')).body.displayName });
});

test('password sign-in off for staff: refused while no admin can sign in through SSO, then staff need SSO', async () => {
  const off = { ...ctx.settings, passwordSignInForStaff: false };
  const refused = await asAdmin('put').send(off);
  expect([refused.status, refused.body.error.code]).toEqual([409, 'SSO_LAST_ADMIN']);
  expect((await passwordSignIn(ctx.users.engineer.email)).status).toBe(200);
  // An admin signs in through the issuer once: now someone can still manage Slackwater.
  const ines = await ssoSignIn(ctx.app, 'ines');
  expect([ines.status, ines.headers.location]).toEqual([302, '/']);
  const accepted = await asAdmin('put').send(off);
  expect([accepted.status, accepted.body.passwordSignInForStaff]).toEqual([200, false]);
  try {
    const engineer = await passwordSignIn(ctx.users.engineer.email);
    expect([engineer.status, engineer.body.error.code]).toEqual([403, 'PASSWORD_SIGN_IN_OFF']);
    expect(engineer.body.error.message).toContain('Harbourline');
    // Tenants keep their passwords.
    expect((await passwordSignIn(ctx.users.tenant.email)).status).toBe(200);
    // An admin too needs SSO while another admin is active; the last active admin keeps the password.
    expect((await passwordSignIn(ctx.users.admin.email)).status).toBe(403);
    const others = (await ctx.db.select({ id: roleGrants.userId }).from(roleGrants).where(eq(roleGrants.role, 'admin')))
      .map((r) => r.id).filter((id) => id !== ctx.users.admin.id);
    await ctx.db.update(users).set({ deactivatedAt: new Date() }).where(inArray(users.id, others));
    try {
      expect((await passwordSignIn(ctx.users.admin.email)).status).toBe(200);
    } finally {
      await ctx.db.update(users).set({ deactivatedAt: null }).where(inArray(users.id, others));
    }
  } finally {
    await asAdmin('put').send(ctx.settings);
  }
  expect((await passwordSignIn(ctx.users.engineer.email)).status).toBe(200);
});
