// Shared set-up for the mail tests: the migrated test database, and a config whose sink listens on any free port.
import { createDb, type Db } from '../../../db/client';
import type pg from 'pg';
import { migrateTestDatabase, testConfig, testDatabaseUrl } from '../helpers/test-app';
import type { ServerConfig } from '../../../server/env';
import { startMailSink, type MailSink } from '../../../server/mail/sink';

export async function openMailTestDb(): Promise<{ db: Db; pool: pg.Pool; config: ServerConfig }> {
  await migrateTestDatabase();
  const { db, pool } = createDb(testDatabaseUrl(), { max: 4 });
  return { db, pool, config: testConfig({ SMTP_URL: 'sink', SMTP_SINK_PORT: '0' }) };
}

/** A recipient address no other test file uses, so readSinkMessages({ to }) sees only this file's mail. */
export function uniqueRecipient(label: string): string {
  return `${label}.${Date.now().toString(36)}${Math.random().toString(36).slice(2, 8)}@tenant.example`;
}

export type MailSinkFixture = { db: Db; config: ServerConfig; sink: MailSink };

/**
 * Registers this file's beforeAll/afterAll: the test database and a running sink. The fields are set in beforeAll;
 * afterAll hooks run in the order they were registered, so register any that must run first before calling this.
 */
export function useMailSink(): MailSinkFixture {
  const fx = {} as MailSinkFixture;
  let pool: pg.Pool;
  beforeAll(async () => {
    const opened = await openMailTestDb();
    ({ db: fx.db, config: fx.config, pool } = opened);
    fx.sink = await startMailSink(fx.config, fx.db);
  });
  afterAll(async () => {
    await fx.sink.stop();
    await pool.end();
  });
  return fx;
}
