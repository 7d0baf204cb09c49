// Shared set-up for the mail tests: the migrated test database, and a config whose sink listens on any free port.
import { createDb, type Db } from '../../../db/client';
import type pg from 'pg';
import { migrateTestDatabase, testConfig, testDatabaseUrl } from '../helpers/test-app';
import type { ServerConfig } from '../../../server/env';

export async function openMailTestDb(): Promise<{ db: Db; pool: pg.Pool; config: ServerConfig }> {
  await migrateTestDatabase();
  const { db, pool } = createDb(testDatabaseUrl(), { max: 4 });
  return { db, pool, config: testConfig({ SMTP_URL: 'sink', SMTP_SINK_PORT: '0' }) };
}

/** A recipient address no other test file uses, so readSinkMessages({ to }) sees only this file's mail. */
export function uniqueRecipient(label: string): string {
  return `${label}.${Date.now().toString(36)}${Math.random().toString(36).slice(2, 8)}@tenant.example`;
}
