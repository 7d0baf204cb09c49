// The last active admin can be neither deactivated nor demoted (409 LAST_ADMIN); with a second admin both work.
// A scratch database of its own, where this file's admin is made the only active one.
import { and, eq, inArray, isNull, notLike } from 'drizzle-orm';
import { roleGrants, users } from '../../../db/schema';
import { useScratchDatabase } from '../helpers/scratch-database';
import { setupPeople, type PeopleContext } from './people-fixture';

let ctx: PeopleContext;
beforeAll(async () => {
  await useScratchDatabase('people_admins');
  ctx = await setupPeople();
  // Earlier runs' admins in this scratch database stop counting.
  const admins = ctx.db.select({ id: roleGrants.userId }).from(roleGrants).where(eq(roleGrants.role, 'admin'));
  await ctx.db.update(users).set({ deactivatedAt: new Date() })
    .where(and(inArray(users.id, admins), notLike(users.id, `${ctx.prefix}-%`), isNull(users.deactivatedAt)));
});
afterAll(() => ctx.close());

test('the only active admin cannot be deactivated or lose the admin role, and nothing changes', async () => {
  const admin = ctx.users.admin.id;
  const off = await ctx.asAdmin('post', `/api/users/${admin}/deactivate`);
  expect([off.status, off.body.error.code]).toEqual([409, 'LAST_ADMIN']);
  expect(off.body.error.message).toMatch(/last active admin/);
  const demote = await ctx.asAdmin('put', `/api/users/${admin}/roles`).send({ roles: ['planner'] });
  expect([demote.status, demote.body.error.code]).toEqual([409, 'LAST_ADMIN']);
  // Adding a role beside admin is fine.
  expect((await ctx.asAdmin('put', `/api/users/${admin}/roles`).send({ roles: ['admin', 'approver'] })).status).toBe(200);
  expect((await ctx.asAdmin('get', '/api/me')).body.roles).toEqual(['admin', 'approver']);
});

test('an invited admin does not count: they cannot sign in yet', async () => {
  await ctx.invite({ email: ctx.unique('invited-admin'), name: 'Invited admin', roles: ['admin'] });
  expect((await ctx.asAdmin('post', `/api/users/${ctx.users.admin.id}/deactivate`)).status).toBe(409);
});

test('with a second active admin, the first may step down', async () => {
  const second = ctx.users.engineer.id;
  expect((await ctx.asAdmin('put', `/api/users/${second}/roles`).send({ roles: ['admin'] })).status).toBe(200);
  const demote = await ctx.asAdmin('put', `/api/users/${ctx.users.admin.id}/roles`).send({ roles: ['planner'] });
  expect([demote.status, demote.body.roles]).toEqual([200, ['planner']]);
});
