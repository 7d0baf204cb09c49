// Windows API tests run in their own scratch database (TEST_DATABASE_URL + "_windows"), because conflicts and
// impact load the whole inventory and other suites' half-built fixtures must not leak into it.
import pg from 'pg';
import { setupTestApp, type TestContext } from '../../helpers/test-app';
import { signInAs } from '../../helpers/sign-in';
import request from 'supertest';

const DUPLICATE_DATABASE = '42P04';
const UNIQUE_VIOLATION = '23505';

async function ensureScratchDatabase(): Promise<void> {
  const base = process.env.TEST_DATABASE_URL;
  if (!base) throw new Error('TEST_DATABASE_URL is not set');
  if (process.env.WINDOWS_TEST_DATABASE_URL) return;
  const url = new URL(base);
  const name = `${url.pathname.slice(1)}_windows`;
  const client = new pg.Client({ connectionString: base });
  await client.connect();
  try {
    await client.query(`create database "${name}"`);
  } catch (err) {
    // Parallel test files race to create it; losing the race is fine.
    const code = (err as { code?: string }).code;
    if (code !== DUPLICATE_DATABASE && code !== UNIQUE_VIOLATION) throw err;
  } finally {
    await client.end();
  }
  url.pathname = `/${name}`;
  process.env.WINDOWS_TEST_DATABASE_URL = url.toString();
  process.env.TEST_DATABASE_URL = url.toString();
}

export type WindowsContext = TestContext & {
  as: (role: keyof TestContext['users']) => Promise<(method: 'get' | 'post' | 'patch' | 'put' | 'delete', path: string) => request.Test>;
  cleanup: () => Promise<void>;
};

export async function setupWindowsApp(now: Date): Promise<WindowsContext> {
  await ensureScratchDatabase();
  const ctx = await setupTestApp();
  const app = ctx.makeApp({ now: () => now });
  const cookies = new Map<string, string>();
  const as: WindowsContext['as'] = async (role) => {
    if (!cookies.has(role)) cookies.set(role, await signInAs(app, ctx.users[role].email));
    const cookie = cookies.get(role)!;
    return (method, path) => request(app)[method](path).set('Cookie', cookie);
  };
  return { ...ctx, app, as, cleanup: () => removePrefixed(ctx.pool, ctx.prefix) };
}

/** Deletes what a test file added (its ids all start with its prefix), so the scratch database stays small. */
async function removePrefixed(pool: pg.Pool, prefix: string): Promise<void> {
  const like = `${prefix}%`;
  await pool.query(`delete from windows where title like $1 or owner_id like $1`, [like]);
  await pool.query(`delete from freezes where title like $1`, [like]);
  await pool.query(`delete from slices where id like $1`, [like]);
  await pool.query(`delete from spans where id like $1`, [like]);
  await pool.query(`delete from sites where id like $1`, [like]);
  await pool.query(`delete from users where id like $1`, [like]);
  await pool.query(`delete from tenants where id like $1`, [like]);
}
