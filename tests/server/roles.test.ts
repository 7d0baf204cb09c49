// Each role allowed and denied on the guarded routes /api/users (admin) and /api/scenarios/validate (admin, planner).
import request from 'supertest';
import { peopleListSchema } from '../../shared/people';
import { signInAs } from './helpers/sign-in';
import { setupTestApp, type TestContext, type TestUsers } from './helpers/test-app';

let ctx: TestContext;
const cookies = {} as Record<keyof TestUsers, string>;
beforeAll(async () => {
  ctx = await setupTestApp();
  for (const key of Object.keys(ctx.users) as (keyof TestUsers)[]) cookies[key] = await signInAs(ctx.app, ctx.users[key].email);
});
afterAll(() => ctx.close());

const everyone: (keyof TestUsers)[] = ['admin', 'engineer', 'planner', 'approver', 'tenant', 'noRoles'];
const expectations: { route: string; call: (cookie?: string) => request.Test; allowed: (keyof TestUsers)[] }[] = [
  {
    route: 'GET /api/users',
    call: (cookie) => request(ctx.app).get('/api/users').set('Cookie', cookie ?? ''),
    allowed: ['admin'],
  },
  {
    route: 'POST /api/scenarios/validate',
    call: (cookie) => request(ctx.app).post('/api/scenarios/validate').set('Cookie', cookie ?? '').send({}),
    allowed: ['admin', 'planner'],
  },
];

describe.each(expectations)('$route', ({ call, allowed }) => {
  test.each(everyone)('as %s', async (who) => {
    const res = await call(cookies[who]);
    if (allowed.includes(who)) {
      expect(res.status).toBe(200);
    } else {
      expect(res.status).toBe(403);
      expect(res.body).toEqual({ error: { code: 'FORBIDDEN', message: expect.any(String) } });
    }
  });

  test('without a session: 401 UNAUTHENTICATED', async () => {
    const res = await call();
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('UNAUTHENTICATED');
  });
});

test('the admin user list holds this file\'s users with their roles and no secrets', async () => {
  const res = await request(ctx.app).get('/api/users').set('Cookie', cookies.admin);
  const { users } = peopleListSchema.parse(res.body);
  const tenantUser = users.find((u) => u.id === ctx.users.tenant.id);
  expect(tenantUser).toEqual({
    id: ctx.users.tenant.id, email: ctx.users.tenant.email, name: `User ${ctx.users.tenant.id}`, roles: ['tenant'], tenantId: ctx.tenantId,
    tenantName: `Tenant ${ctx.prefix}`, status: 'active', createdAt: expect.any(String), deactivatedAt: null, invitationExpiresAt: null,
  });
  expect(JSON.stringify(res.body)).not.toMatch(/argon2|password/i);
});
