// Hostile import files against a listening API: for each, how long the upload takes to be answered and the
// slowest /api/health answer while it is in flight, next to the targets (answer ≤ 5 s, health ≤ 200 ms).
// Usage: npm run bench:hostile   (uses its own database, slackwater_bench_hostile, in the project cluster)
import { execFileSync } from 'node:child_process';
import type { AddressInfo } from 'node:net';
import { performance } from 'node:perf_hooks';
import { uploadChecks } from '../server/imports/check-thread';
import { hostileFiles, overBudgetFile, type HostileFile } from '../tests/server/imports/helpers/hostile-files';
import { signInAs } from '../tests/server/helpers/sign-in';

const ANSWER_TARGET_MS = 5000;
const HEALTH_TARGET_MS = 200;
const DB_NAME = 'slackwater_bench_hostile';

type Row = { label: string; status: number; code: string; answerMs: number; healthCount: number; slowestHealthMs: number };

async function measure(base: string, cookie: string, file: HostileFile): Promise<Row> {
  let done = false;
  const healthMs: number[] = [];
  const form = new FormData();
  form.append('file', new Blob([file.text]), file.name);
  const started = performance.now();
  const answer = fetch(`${base}/api/imports`, { method: 'POST', headers: { Cookie: cookie }, body: form })
    .then(async (res) => { done = true; return { status: res.status, body: await res.json() as { error?: { code: string } } }; });
  const poll = (async () => {
    while (!done) {
      const t = performance.now();
      const res = await fetch(`${base}/api/health`);
      await res.arrayBuffer();
      healthMs.push(performance.now() - t);
    }
  })();
  const { status, body } = await answer;
  const answerMs = performance.now() - started;
  await poll;
  return { label: file.label, status, code: body.error?.code ?? '-', answerMs, healthCount: healthMs.length, slowestHealthMs: Math.max(0, ...healthMs) };
}

async function main(): Promise<void> {
  execFileSync('bash', ['scripts/pg.sh', 'recreatedb', DB_NAME], { stdio: ['ignore', 'ignore', 'inherit'] });
  process.env.TEST_DATABASE_URL = execFileSync('bash', ['scripts/pg.sh', 'url', DB_NAME]).toString().trim();
  // The test harness migrates, adds one user per role and builds the app; loaded after the URL is set.
  const { setupTestApp } = await import('../tests/server/helpers/test-app');
  const ctx = await setupTestApp();
  const cookie = await signInAs(ctx.app, ctx.users.planner.email);
  const server = ctx.app.listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
  const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  const rows: Row[] = [];
  try {
    // The first upload also starts a check thread (it compiles its TypeScript); shown as its own row.
    const warmUp = { label: 'warm-up: small CSV, thread start', name: 'sites.csv', text: 'id,name,kind,lat,lon,cpu\n', codes: [] };
    for (const file of [warmUp, ...hostileFiles(), overBudgetFile()]) rows.push(await measure(base, cookie, file));
  } finally {
    server.close();
    await uploadChecks.close();
    await ctx.close();
  }
  console.log(`targets: answer ≤ ${ANSWER_TARGET_MS} ms, slowest health ≤ ${HEALTH_TARGET_MS} ms (cores: shared)`);
  console.table(rows.map((r) => ({
    file: r.label, status: r.status, code: r.code, 'answer ms': Math.round(r.answerMs), 'health answers': r.healthCount,
    'slowest health ms': Math.round(r.slowestHealthMs),
    met: r.label.startsWith('warm-up') ? '-' : r.answerMs <= ANSWER_TARGET_MS && r.slowestHealthMs <= HEALTH_TARGET_MS && r.status >= 400 && r.status < 500 ? 'yes' : 'NO',
  })));
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
