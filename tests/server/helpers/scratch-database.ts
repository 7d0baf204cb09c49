// A scratch database next to the test database, for suites that load the whole inventory or change global
// policies, so other suites' half-built fixtures (or their policy changes) never meet theirs.
import pg from 'pg';

const DUPLICATE_DATABASE = '42P04';
const UNIQUE_VIOLATION = '23505';

/**
 * Creates `<test db>_<suffix>` if missing and points TEST_DATABASE_URL at it (jest gives each test file its own
 * process.env, so this lasts for the file). Calling it again in the same file is a no-op.
 */
export async function useScratchDatabase(suffix: string): Promise<void> {
  const base = process.env.TEST_DATABASE_URL;
  if (!base) throw new Error('TEST_DATABASE_URL is not set');
  const url = new URL(base);
  if (url.pathname.endsWith(`_${suffix}`)) return;
  const name = `${url.pathname.slice(1)}_${suffix}`;
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
  process.env.TEST_DATABASE_URL = url.toString();
}
