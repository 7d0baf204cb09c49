// Single sign-on against the local OpenID Connect issuer: the redirect, the happy path, and each refusal
// (wrong state, wrong nonce, expired or tampered ID token, no mapped group, tenant account), plus roles that
// follow the issuer's groups at every sign-in.
import { and, eq, inArray } from 'drizzle-orm';
import request from 'supertest';
import { auditLog, roleGrants, users } from '../../../db/schema';
import { sessionCookieFrom, sessionSetCookie } from '../helpers/test-app';
import { person, pendingCookieFrom, setupSso, ssoSignIn, type SsoContext } from './sso-fixture';
import { signInAtIssuer, TEST_CLIENT_ID } from './local-issuer';

let ctx: SsoContext;
const people = (p: string, boGroups = ['change-board']) => [
  person('ada', p, ['noc-engineers', 'network-planning']),
  person('bo', p, boGroups),
  person('cy', p, ['facilities']),
  person('dee', p, ['noc-engineers']),
  person('eve', p, ['noc-engineers']),
  person('fay', p, ['noc-engineers'], `tenant.${p}@test.example`),
];
beforeAll(async () => {
  ctx = await setupSso('sso_flow', (p) => people(p));
}, 60_000);
afterAll(() => ctx.close());

const me = (cookie: string) => request(ctx.app).get('/api/me').set('Cookie', cookie);
const refusedWith = (res: request.Response, reason: string) => {
  expect([res.status, res.headers.location, sessionSetCookie(res)]).toEqual([302, `/sign-in?sso_error=${reason}`, undefined]);
};

test('start: 302 to the issuer with PKCE S256, state and nonce, and an HttpOnly pending cookie', async () => {
  const res = await request(ctx.app).get('/api/auth/sso/start');
  expect(res.status).toBe(302);
  const url = new URL(res.headers.location);
  expect(url.origin).toBe(ctx.issuer.url);
  const q = Object.fromEntries(url.searchParams);
  expect(q).toMatchObject({ response_type: 'code', client_id: TEST_CLIENT_ID, code_challenge_method: 'S256' });
  expect(q.scope.split(' ')).toContain('openid');
  for (const key of ['state', 'nonce', 'code_challenge']) expect(q[key]).toMatch(/^[A-Za-z0-9_-]{20,}$/);
  expect(q.state).not.toBe(q.nonce);
  expect(pendingCookieFrom(res)).toMatch(/^slackwater_sso=/);
  expect((res.headers['set-cookie'] as unknown as string[]).join()).toMatch(/HttpOnly/i);
});

test('first sign-in creates the user with the roles its groups map to, and opens a session', async () => {
  const res = await ssoSignIn(ctx.app, 'ada');
  expect([res.status, res.headers.location]).toEqual([302, '/']);
  const body = (await me(sessionCookieFrom(res))).body;
  expect([body.email, body.name, body.roles, body.tenantId]).toEqual([`ada.${ctx.prefix}@sso.example`, 'Person ada', ['engineer', 'planner'], null]);
  const created = await ctx.db.select().from(auditLog).where(and(eq(auditLog.action, 'sso-user-created'), eq(auditLog.entityId, body.id)));
  expect(created).toHaveLength(1);
  // The same person again is the same user, not a second one.
  const again = await ssoSignIn(ctx.app, 'ada');
  expect((await me(sessionCookieFrom(again))).body.id).toBe(body.id);
});

test('a group change on the issuer is a role change at the next sign-in', async () => {
  const first = await ssoSignIn(ctx.app, 'bo');
  expect((await me(sessionCookieFrom(first))).body.roles).toEqual(['approver']);
  ctx.issuer.setPeople(people(ctx.prefix, ['noc-engineers', 'slackwater-admins']));
  const second = await ssoSignIn(ctx.app, 'bo');
  const body = (await me(sessionCookieFrom(second))).body;
  expect(body.roles).toEqual(['admin', 'engineer']);
  const [row] = await ctx.db.select().from(auditLog).where(and(eq(auditLog.action, 'sso-roles-changed'), eq(auditLog.entityId, body.id)));
  expect([row.before, (row.after as { roles: string[] }).roles]).toEqual([{ roles: ['approver'] }, ['admin', 'engineer']]);
  // Out of every mapped group: refused, and the roles are gone too.
  ctx.issuer.setPeople(people(ctx.prefix, ['facilities']));
  refusedWith(await ssoSignIn(ctx.app, 'bo'), 'no-access');
  expect((await me(sessionCookieFrom(second))).body.roles).toEqual([]);
});

test('no mapped group: refused with no-access, and no user is created', async () => {
  refusedWith(await ssoSignIn(ctx.app, 'cy'), 'no-access');
  expect(await ctx.db.select().from(users).where(eq(users.email, `cy.${ctx.prefix}@sso.example`))).toEqual([]);
});

test('a state that is not the one this browser started with: refused with state', async () => {
  const start = await request(ctx.app).get('/api/auth/sso/start');
  const callback = await signInAtIssuer(start.headers.location, 'dee');
  const forged = callback.replace(/state=[^&]+/, 'state=forged-state-value');
  refusedWith(await request(ctx.app).get(forged).set('Cookie', pendingCookieFrom(start)), 'state');
  // The right state without the browser's pending cookie is refused too.
  refusedWith(await request(ctx.app).get(callback), 'state');
});

test('an ID token carrying another nonce: refused with nonce', async () => {
  refusedWith(await ssoSignIn(ctx.app, 'dee', { alter: (url) => url.searchParams.set('nonce', 'a-nonce-this-browser-never-sent') }), 'nonce');
});

test('an expired ID token: refused with token', async () => {
  const later = ctx.makeApp({ now: () => new Date(Date.now() + 3 * 60 * 60 * 1000) });
  refusedWith(await ssoSignIn(ctx.app, 'dee', { callbackApp: later }), 'token');
});

test('a tampered ID token (claims changed after signing): refused with token', async () => {
  const realFetch = globalThis.fetch;
  const spy = jest.spyOn(globalThis, 'fetch').mockImplementation(async (input, init) => {
    const res = await realFetch(input, init);
    if (!String(input instanceof Request ? input.url : input).endsWith('/token')) return res;
    const body = await res.json() as { id_token: string };
    const [h, p, s] = body.id_token.split('.');
    const claims = JSON.parse(Buffer.from(p, 'base64url').toString());
    claims.groups = ['slackwater-admins'];
    body.id_token = [h, Buffer.from(JSON.stringify(claims)).toString('base64url'), s].join('.');
    return new Response(JSON.stringify(body), { status: res.status, headers: { 'content-type': 'application/json' } });
  });
  try {
    refusedWith(await ssoSignIn(ctx.app, 'eve'), 'token');
    expect(spy).toHaveBeenCalled();
  } finally {
    spy.mockRestore();
  }
});

test('an issuer account with a tenant user\'s e-mail is refused: tenants never sign in through SSO', async () => {
  refusedWith(await ssoSignIn(ctx.app, 'fay'), 'tenant');
  expect((await ctx.db.select().from(users).where(eq(users.id, ctx.users.tenant.id)))[0].tenantId).toBe(ctx.tenantId);
});

test('the issuer never takes the admin role from the last active admin; the role follows the groups again once another admin exists', async () => {
  const admins = (groups: string[]) => [...people(ctx.prefix), person('gus', ctx.prefix, groups)];
  ctx.issuer.setPeople(admins(['slackwater-admins']));
  const gus = (await me(sessionCookieFrom(await ssoSignIn(ctx.app, 'gus')))).body as { id: string; roles: string[] };
  expect(gus.roles).toEqual(['admin']);
  // Every other admin deactivated: gus is the last active one.
  const others = (await ctx.db.select({ id: roleGrants.userId }).from(roleGrants).where(eq(roleGrants.role, 'admin')))
    .map((r) => r.id).filter((id) => id !== gus.id);
  await ctx.db.update(users).set({ deactivatedAt: new Date() }).where(inArray(users.id, others));
  try {
    ctx.issuer.setPeople(admins(['noc-engineers']));
    const kept = await me(sessionCookieFrom(await ssoSignIn(ctx.app, 'gus')));
    expect(kept.body.roles).toEqual(['admin', 'engineer']);
    const audit = await ctx.db.select().from(auditLog).where(and(eq(auditLog.action, 'sso-last-admin-kept'), eq(auditLog.entityId, gus.id)));
    expect(audit).toHaveLength(1);
  } finally {
    await ctx.db.update(users).set({ deactivatedAt: null }).where(inArray(users.id, others));
  }
  const demoted = await me(sessionCookieFrom(await ssoSignIn(ctx.app, 'gus')));
  expect(demoted.body.roles).toEqual(['engineer']);
});
