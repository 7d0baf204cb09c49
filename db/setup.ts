// `npx tsx db/setup.ts`: apply the committed migrations to DATABASE_URL, then seed the demo (idempotent).
import fs from 'node:fs';
import path from 'node:path';
import { createDb } from './client';
import { migrateDatabase } from './migrate';
import { seedDemo } from './seed';
import { countSeededRows } from './queries/count-seeded-rows';
import { SCENARIO_FORMAT } from '../shared/scenario';

const DEMO_FILE = path.resolve(__dirname, '..', 'scenarios', 'demo.json');

function loadDemoScenario(): unknown {
  if (fs.existsSync(DEMO_FILE)) return JSON.parse(fs.readFileSync(DEMO_FILE, 'utf8'));
  console.error(`setup: ${path.relative(process.cwd(), DEMO_FILE)} not found; seeding the demo accounts only`);
  return { format: SCENARIO_FORMAT, sites: [], spans: [], tenants: [], slices: [], placements: [] };
}

async function main(): Promise<void> {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('DATABASE_URL is not set (npm start sets it for the project-local PostgreSQL)');
  await migrateDatabase(url);
  console.error('setup: migrations applied');
  const { db, pool } = createDb(url, { max: 1 });
  try {
    const added = await seedDemo(db, loadDemoScenario(), { now: new Date() });
    const counts = await countSeededRows(db);
    const newRows = Object.values(added).reduce((a, b) => a + b, 0);
    console.error(`setup: seed ${newRows === 0 ? 'already in place' : `added ${newRows} rows`}; ` +
      Object.entries(counts).map(([k, v]) => `${k} ${v}`).join(', '));
  } finally {
    await pool.end();
  }
}

main().catch((err: unknown) => {
  console.error(`setup failed: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
