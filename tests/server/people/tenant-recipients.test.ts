// Who reads a tenant's notices: its accounts that can sign in. A deactivated account or one whose invitation is
// still open gets no notice mail; both stay attached to the tenant (the import's removal check still sees them).
import { selectActiveUsersOfTenants, selectUsersOfTenants } from '../../../server/queries/auth/tenant-users';
import { users } from '../../../db/schema';
import { setupTestApp, type TestContext } from '../helpers/test-app';

let ctx: TestContext;
beforeAll(async () => { ctx = await setupTestApp(); }, 60_000);
afterAll(() => ctx.close());

test('deactivated and invited tenant accounts are left out of notice recipients but still belong to the tenant', async () => {
  const id = (s: string) => `${ctx.prefix}-rcpt-${s}`;
  await ctx.db.insert(users).values([
    { id: id('gone'), email: `${id('gone')}@test.example`, name: 'Gone', tenantId: ctx.tenantId, deactivatedAt: new Date() },
    { id: id('invited'), email: `${id('invited')}@test.example`, name: 'Invited', tenantId: ctx.tenantId, invitationPending: true },
  ]);
  const active = (await selectActiveUsersOfTenants(ctx.db, [ctx.tenantId])).map((u) => u.id);
  expect(active).toContain(ctx.users.tenant.id);
  expect(active).not.toContain(id('gone'));
  expect(active).not.toContain(id('invited'));
  const all = (await selectUsersOfTenants(ctx.db, [ctx.tenantId])).map((u) => u.id);
  expect(all).toEqual(expect.arrayContaining([ctx.users.tenant.id, id('gone'), id('invited')]));
});
