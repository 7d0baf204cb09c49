// `npx tsx db/setup.ts`: apply the committed migrations to DATABASE_URL, then seed the demo (idempotent; skipped
// with SEED_DEMO=false), create the admin named by ADMIN_EMAIL / ADMIN_PASSWORD, or print a one-time set-up link.
import path from 'node:path';
import { createDb } from './client';
import { migrateDatabase } from './migrate';
import { countSeededRows } from './queries/count-seeded-rows';
import { DEMO_FILE, readDemoFile } from './seed/demo-identity';
import { parseSetupEnv, SetupEnvError } from './setup-env';
import { runSetup } from './setup-run';
import { SCENARIO_FORMAT } from '../shared/scenario';
// eslint-disable-next-line no-restricted-imports -- the set-up entry applies the one password policy to ADMIN_PASSWORD
import { judgePassword } from '../server/auth/password-policy';

function loadDemoScenario(): unknown {
  const scenario = readDemoFile();
  if (scenario !== null) return scenario;
  console.error(`setup: ${path.relative(process.cwd(), DEMO_FILE)} not found; seeding the demo accounts only`);
  return { format: SCENARIO_FORMAT, sites: [], spans: [], tenants: [], slices: [], placements: [] };
}

async function main(): Promise<void> {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('DATABASE_URL is not set (npm start sets it for the project-local PostgreSQL)');
  // Before migrating: a wrong variable stops setup without touching the database.
  const env = parseSetupEnv(process.env, {
    judgePassword: (password, person) => {
      const verdict = judgePassword(password, person);
      return verdict.acceptable ? [] : verdict.problems;
    },
  });
  await migrateDatabase(url);
  console.error('setup: migrations applied');
  const { db, pool } = createDb(url, { max: 1 });
  try {
    const log = (line: string) => console.error(line);
    const outcome = await runSetup(db, env, { now: new Date(), demoScenario: loadDemoScenario, log });
    if (outcome.seeded) {
      const counts = await countSeededRows(db);
      const newRows = Object.values(outcome.seeded).reduce((a, b) => a + b, 0);
      console.error(`setup: seed ${newRows === 0 ? 'already in place' : `added ${newRows} rows`}; ` +
        Object.entries(counts).map(([k, v]) => `${k} ${v}`).join(', '));
    }
  } finally {
    await pool.end();
  }
}

main().catch((err: unknown) => {
  const message = err instanceof Error ? err.message : String(err);
  console.error(err instanceof SetupEnvError ? `setup refused: ${message}` : `setup failed: ${message}`);
  process.exit(1);
});
