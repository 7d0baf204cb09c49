// Test harness: migrates the test database (TEST_DATABASE_URL), adds this file's own users, builds createApp().
import { randomUUID } from 'node:crypto';
import type express from 'express';
import pg from 'pg';
import type request from 'supertest';
import { createDb, type Db } from '../../../db/client';
import { migrateDatabase } from '../../../db/migrate';
import { passwordCredentials, roleGrants, tenants, users } from '../../../db/schema';
import { createApp, type AppDeps } from '../../../server/app';
import { hashPassword } from '../../../server/auth/password';
import { SESSION_COOKIE } from '../../../server/auth/session-cookie';
import { parseEnv, type ServerConfig } from '../../../server/env';
import type { RoleName } from '../../../shared/api';

export const TEST_PASSWORD = 'test-password-1';
/** Any fixed number for the advisory lock that serialises migrations across parallel jest workers. */
const MIGRATION_LOCK_KEY = 5_437_201;

export function testDatabaseUrl(): string {
  const url = process.env.TEST_DATABASE_URL;
  if (!url) throw new Error('TEST_DATABASE_URL is not set (npm test sets it; e.g. postgres://postgres@127.0.0.1:54329/slackwater_test)');
  return url;
}

let migrated: Promise<void> | null = null;

/** Migrates once per worker, holding a PostgreSQL advisory lock so parallel test files do not race. */
export function migrateTestDatabase(): Promise<void> {
  migrated ??= (async () => {
    const client = new pg.Client({ connectionString: testDatabaseUrl() });
    await client.connect();
    try {
      await client.query('select pg_advisory_lock($1)', [MIGRATION_LOCK_KEY]);
      await migrateDatabase(testDatabaseUrl());
    } finally {
      await client.query('select pg_advisory_unlock($1)', [MIGRATION_LOCK_KEY]).catch(() => undefined);
      await client.end();
    }
  })();
  return migrated;
}

export type TestUser = { id: string; email: string; roles: RoleName[]; tenantId: string | null };
export type TestUsers = Record<'admin' | 'engineer' | 'planner' | 'approver' | 'tenant' | 'noRoles', TestUser>;

/** One tenant and one user per role (plus one without roles), all with ids unique to this run. */
export async function insertTestUsers(db: Db, prefix: string): Promise<{ tenantId: string; users: TestUsers }> {
  const tenantId = `${prefix}-tenant`;
  await db.insert(tenants).values({ id: tenantId, name: `Tenant ${prefix}`, noticeDays: 7 });
  const make = (key: string, roles: RoleName[], tenant: string | null): TestUser =>
    ({ id: `${prefix}-${key}`, email: `${key}.${prefix}@test.example`, roles, tenantId: tenant });
  const list: TestUsers = {
    admin: make('admin', ['admin'], null),
    engineer: make('engineer', ['engineer'], null),
    planner: make('planner', ['planner'], null),
    approver: make('approver', ['approver'], null),
    tenant: make('tenant', ['tenant'], tenantId),
    noRoles: make('noroles', [], null),
  };
  const passwordHash = await hashPassword(TEST_PASSWORD);
  for (const user of Object.values(list)) await insertUser(db, { ...user, name: `User ${user.id}` }, passwordHash);
  return { tenantId, users: list };
}

type NewUser = { id: string; email: string; name: string; roles: RoleName[]; tenantId?: string | null };

/** A user who signs in with TEST_PASSWORD; pass a hash of it to skip hashing again when adding many. */
export async function insertUser(db: Db, user: NewUser, passwordHash?: string): Promise<void> {
  await db.insert(users).values({ id: user.id, email: user.email, name: user.name, tenantId: user.tenantId ?? null });
  await db.insert(passwordCredentials).values({ userId: user.id, passwordHash: passwordHash ?? await hashPassword(TEST_PASSWORD) });
  for (const role of user.roles) await db.insert(roleGrants).values({ userId: user.id, role });
}

export function testConfig(overrides: Record<string, string> = {}): ServerConfig {
  return parseEnv({ DATABASE_URL: testDatabaseUrl(), NODE_ENV: 'test', WEB_DIST: '/nonexistent-web-dist', ...overrides });
}

export type TestContext = {
  db: Db;
  pool: pg.Pool;
  prefix: string;
  tenantId: string;
  users: TestUsers;
  config: ServerConfig;
  app: express.Application;
  /** Another app on the same database, e.g. with a different clock or rate limit. */
  makeApp: (overrides?: Partial<AppDeps>) => express.Application;
  close: () => Promise<void>;
};

export async function setupTestApp(): Promise<TestContext> {
  await migrateTestDatabase();
  const { db, pool } = createDb(testDatabaseUrl(), { max: 4 });
  const prefix = `t${randomUUID().slice(0, 8)}`;
  const { tenantId, users: testUsers } = await insertTestUsers(db, prefix);
  const config = testConfig();
  const makeApp = (overrides: Partial<AppDeps> = {}) =>
    createApp({ db, pool, config, signInLimit: { windowMs: 60_000, perAccount: 1000, perAddress: 1000 }, ...overrides });
  return { db, pool, prefix, tenantId, users: testUsers, config, app: makeApp(), makeApp, close: () => pool.end() };
}

/** The raw Set-Cookie line for the session cookie, or undefined. */
export function sessionSetCookie(res: request.Response): string | undefined {
  const header = res.headers['set-cookie'] as unknown as string[] | undefined;
  return header?.find((line) => line.startsWith(`${SESSION_COOKIE}=`));
}

/** "slackwater_session=<token>", ready for a Cookie header. */
export function sessionCookieFrom(res: request.Response): string {
  const line = sessionSetCookie(res);
  if (!line) throw new Error(`no ${SESSION_COOKIE} cookie in the response (status ${res.status})`);
  return line.split(';')[0];
}
