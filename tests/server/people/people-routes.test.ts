// People routes against PostgreSQL: each role on every new route, search and filters, role changes that keep a
// tenant contact bound to one tenant, deactivation that ends every session at once, and their audit rows.
import request from 'supertest';
import { peopleListSchema } from '../../../shared/people';
import { insertUser, sessionCookieFrom, TEST_PASSWORD, type TestUsers } from '../helpers/test-app';
import { setupPeople, type PeopleContext } from './people-fixture';

let ctx: PeopleContext;
beforeAll(async () => { ctx = await setupPeople(); });
afterAll(() => ctx.close());

const others: (keyof TestUsers)[] = ['engineer', 'planner', 'approver', 'tenant', 'noRoles'];
const ADMIN_ROUTES: [string, () => string][] = [
  ['GET /api/users', () => '/api/users?status=active'],
  ['PUT /api/users/:id/roles', () => `/api/users/${ctx.users.engineer.id}/roles`],
  ['POST /api/users/:id/deactivate', () => `/api/users/${ctx.users.engineer.id}/deactivate`],
  ['POST /api/users/:id/reactivate', () => `/api/users/${ctx.users.engineer.id}/reactivate`],
  ['POST /api/invitations', () => '/api/invitations'],
  ['POST /api/invitations/:id/resend', () => `/api/invitations/${ctx.users.engineer.id}/resend`],
  ['DELETE /api/invitations/:id', () => `/api/invitations/${ctx.users.engineer.id}`],
];

describe.each(ADMIN_ROUTES)('%s (admin only)', (route, path) => {
  const call = (cookie?: string) => {
    const method = route.split(' ')[0].toLowerCase() as 'get' | 'post' | 'put' | 'delete';
    const req = request(ctx.app)[method](path()).set('Cookie', cookie ?? '');
    return method === 'get' || method === 'delete' ? req : req.send({ roles: ['planner'], email: 'x@test.example', name: 'X' });
  };
  test.each(others)('as %s: 403 and nothing changes', async (who) => {
    const res = await call(ctx.cookies[who]);
    expect([res.status, res.body.error?.code]).toEqual([403, 'FORBIDDEN']);
    expect(await ctx.auditOf(ctx.users.engineer.id)).toEqual([]);
  });
  test('without a session: 401', async () => {
    expect((await call()).status).toBe(401);
  });
});

test('the invitee\'s own routes answer anyone, and a made-up link is not found', async () => {
  for (const cookie of ['', ctx.cookies.tenant, ctx.cookies.admin]) {
    expect((await request(ctx.app).get(`/api/invitations/link/${'A'.repeat(43)}`).set('Cookie', cookie)).status).toBe(404);
    const res = await request(ctx.app).post('/api/invitations/accept').set('Cookie', cookie).send({ token: 'A'.repeat(43), password: 'quiet ferry lantern 84 gulls' });
    expect([res.status, res.body.error.code]).toEqual([404, 'INVITATION_LINK_INVALID']);
  }
});

async function list(query: string) {
  const res = await ctx.asAdmin('get', `/api/users?${query}`);
  expect(res.status).toBe(200);
  return peopleListSchema.parse(res.body).users;
}

async function newPerson(key: string, roles: TestUsers['admin']['roles'], tenantId: string | null = null) {
  const user = { id: `${ctx.prefix}-${key}`, email: `${key}.${ctx.prefix}@test.example`, name: `Person ${key} ${ctx.prefix}`, roles, tenantId };
  await insertUser(ctx.db, user);
  return user;
}

test('search by name or e-mail text and filter by role, tenant and status', async () => {
  const mine = (users: { id: string }[]) => users.map((u) => u.id).filter((id) => id.startsWith(ctx.prefix)).sort();
  expect(mine(await list(`q=${encodeURIComponent(`USER ${ctx.users.tenant.id.toUpperCase()}`)}`))).toEqual([ctx.users.tenant.id]);
  expect(mine(await list(`q=${ctx.prefix}-nobody`))).toEqual([]);
  // Wildcards in the text stand for themselves.
  expect(mine(await list(`q=${ctx.prefix}%25admin`))).toEqual([]);
  expect(mine(await list(`q=${encodeURIComponent(`tenant.${ctx.prefix}`)}`))).toEqual([ctx.users.tenant.id]);
  expect(mine(await list(`q=${ctx.prefix}&role=approver`))).toEqual([ctx.users.approver.id]);
  expect(mine(await list(`tenant=${ctx.tenantId}`))).toEqual([ctx.users.tenant.id]);
  const invited = await ctx.invite({ email: ctx.unique('filter'), name: `Invited ${ctx.prefix}`, roles: ['engineer'] });
  const ids = (users: { id: string }[]) => users.map((u) => u.id);
  expect(ids(await list(`q=${ctx.prefix}&status=invited`))).toEqual([invited.body.id]);
  expect(ids(await list(`q=${ctx.prefix}&status=active`))).not.toContain(invited.body.id);
  expect((await ctx.asAdmin('get', '/api/users?status=asleep')).status).toBe(400);
});

test('roles change as a set, with an audit row holding before and after', async () => {
  const p = await newPerson('roles', ['engineer']);
  const res = await ctx.asAdmin('put', `/api/users/${p.id}/roles`).send({ roles: ['planner', 'approver'] });
  expect(res.status).toBe(200);
  expect(res.body).toMatchObject({ roles: ['planner', 'approver'], tenantId: null, status: 'active' });
  expect(await ctx.auditOf(p.id)).toEqual([{
    actorId: ctx.users.admin.id, action: 'user.roles',
    before: { roles: ['engineer'], tenantId: null }, after: { roles: ['planner', 'approver'], tenantId: null },
  }]);
});

test('a tenant contact belongs to exactly one tenant and holds no operator role', async () => {
  const p = await newPerson('bound', ['engineer']);
  const put = (body: object) => ctx.asAdmin('put', `/api/users/${p.id}/roles`).send(body);
  expect((await put({ roles: ['tenant'] })).status).toBe(400);
  expect((await put({ roles: ['tenant', 'planner'], tenantId: ctx.tenantId })).status).toBe(400);
  expect((await put({ roles: ['planner'], tenantId: ctx.tenantId })).status).toBe(400);
  expect((await put({ roles: ['tenant'], tenantId: 'no-such-tenant' })).body.error.code).toBe('UNKNOWN_TENANT');
  expect(await ctx.auditOf(p.id)).toEqual([]);
  const bound = await put({ roles: ['tenant'], tenantId: ctx.tenantId });
  expect(bound.body).toMatchObject({ roles: ['tenant'], tenantId: ctx.tenantId, tenantName: `Tenant ${ctx.prefix}` });
  const back = await put({ roles: ['engineer'] });
  expect(back.body).toMatchObject({ roles: ['engineer'], tenantId: null });
});

test('deactivation ends every session at once, refuses sign-in plainly, and reactivation lets them in again', async () => {
  const p = await newPerson('leaver', ['planner']);
  const signIn = () => request(ctx.app).post('/api/auth/sign-in').send({ email: p.email, password: TEST_PASSWORD });
  const sessions = [sessionCookieFrom(await signIn()), sessionCookieFrom(await signIn())];
  const off = await ctx.asAdmin('post', `/api/users/${p.id}/deactivate`);
  expect(off.body).toMatchObject({ status: 'deactivated', deactivatedAt: expect.any(String) });
  for (const cookie of sessions) expect((await request(ctx.app).get('/api/me').set('Cookie', cookie)).status).toBe(401);
  const refused = await signIn();
  expect([refused.status, refused.body.error.code]).toEqual([403, 'ACCOUNT_DEACTIVATED']);
  expect(refused.body.error.message).toMatch(/deactivated.*admin/);
  // A wrong password learns nothing about the account's state.
  expect((await request(ctx.app).post('/api/auth/sign-in').send({ email: p.email, password: 'wrong' })).body.error.code).toBe('BAD_CREDENTIALS');
  expect((await ctx.asAdmin('post', `/api/users/${p.id}/deactivate`)).body.error.code).toBe('ALREADY_DEACTIVATED');
  const on = await ctx.asAdmin('post', `/api/users/${p.id}/reactivate`);
  expect(on.body).toMatchObject({ status: 'active', deactivatedAt: null });
  expect((await signIn()).status).toBe(200);
  const audit = await ctx.auditOf(p.id);
  expect(audit.filter((r) => r.action.startsWith('user.')).map((r) => [r.action, r.actorId])).toEqual([
    ['user.deactivate', ctx.users.admin.id], ['user.reactivate', ctx.users.admin.id],
  ]);
  expect(audit.find((r) => r.action === 'user.deactivate')!.after).toMatchObject({ sessionsEnded: 2 });
});

test('an unknown person is 404 and an invited one is revoked rather than deactivated', async () => {
  expect((await ctx.asAdmin('post', '/api/users/nobody/deactivate')).body.error.code).toBe('PERSON_NOT_FOUND');
  const invited = await ctx.invite({ email: ctx.unique('pending'), name: 'Pending', roles: ['planner'] });
  expect((await ctx.asAdmin('post', `/api/users/${invited.body.id}/deactivate`)).body.error.code).toBe('INVITATION_PENDING');
});
