// Drops a test's own pg-boss schema. Several test files drop their schemas at the same moment on one server,
// and a drop can lose a deadlock to another session's catalogue locks (SQLSTATE 40P01); PostgreSQL's own
// advice for a deadlock victim is to run the transaction again, so the drop is retried a few times.
import pg from 'pg';

const DEADLOCK_DETECTED = '40P01';
const ATTEMPTS = 5;

/** `drop schema … cascade` on its own connection, retried when PostgreSQL picks it as a deadlock victim. */
export async function dropTestSchema(url: string, schema: string): Promise<void> {
  if (!/^[a-z0-9_]+$/.test(schema)) throw new Error(`not a test schema name: ${schema}`);
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    for (let attempt = 1; ; attempt++) {
      try {
        await client.query(`drop schema if exists "${schema}" cascade`);
        return;
      } catch (err) {
        const code = (err as { code?: string }).code;
        if (code !== DEADLOCK_DETECTED || attempt >= ATTEMPTS) throw err;
        await new Promise((resolve) => setTimeout(resolve, 100 * attempt));
      }
    }
  } finally {
    await client.end();
  }
}
