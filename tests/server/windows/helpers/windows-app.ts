// Windows API tests run in their own scratch database (TEST_DATABASE_URL + "_windows"), because conflicts and
// impact load the whole inventory and other suites' half-built fixtures must not leak into it.
import { removePrefixed } from '../../helpers/remove-prefixed';
import { useScratchDatabase } from '../../helpers/scratch-database';
import { signedInRequests, type AsUser } from '../../helpers/sign-in';
import { setupTestApp, type TestContext } from '../../helpers/test-app';

export type WindowsContext = TestContext & {
  as: AsUser<keyof TestContext['users']>;
  cleanup: () => Promise<void>;
};

export async function setupWindowsApp(now: Date): Promise<WindowsContext> {
  await useScratchDatabase('windows');
  const ctx = await setupTestApp();
  const app = ctx.makeApp({ now: () => now });
  const as: WindowsContext['as'] = signedInRequests(app, (role) => ctx.users[role].email);
  // Deletes what the file added, so the scratch database stays small.
  const cleanup = () => removePrefixed(ctx.pool, ctx.prefix, [['windows', ['title', 'owner_id']], ['freezes', ['title']]]);
  return { ...ctx, app, as, cleanup };
}
