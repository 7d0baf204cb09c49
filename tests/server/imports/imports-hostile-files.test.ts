// Hostile GraphML files answer 4xx with a code, and /api/health keeps answering while each one is read.
import request from 'supertest';
import { importRowCount, setupScratchApp, upload, type ImportsContext } from './helpers/scratch-app';
import { hostileFiles, overBudgetFile, type HostileFile } from './helpers/hostile-files';

let ctx: ImportsContext;
beforeAll(async () => { ctx = await setupScratchApp({ seedDemo: false }); }, 60_000);
afterAll(() => ctx.dropDatabase());

/** Uploads the file while polling /api/health one request after another until the upload answers. */
async function uploadWhilePolling(file: HostileFile) {
  let done = false;
  const healthStatuses: number[] = [];
  const answer = upload(ctx, file).then((res) => { done = true; return res; });
  const poll = (async () => {
    while (!done) healthStatuses.push((await request(ctx.app).get('/api/health')).status);
  })();
  const res = await answer;
  const answeredBefore = healthStatuses.length;
  await poll;
  return { res, answeredBefore, healthStatuses };
}

test.each(hostileFiles().map((f) => [f.label, f] as const))('%s: refused with a code, health answers throughout', async (_label, file) => {
  const rowsBefore = await importRowCount(ctx.pool);
  const { res, healthStatuses } = await uploadWhilePolling(file);
  expect(res.status).toBeGreaterThanOrEqual(400);
  expect(res.status).toBeLessThan(500);
  expect(file.codes).toContain(res.body.error.code);
  expect(res.body.error.message).toContain(file.name);
  // Each of these is now refused in milliseconds, so how many health answers fit in is not fixed; all must be 200.
  expect(healthStatuses.every((s) => s === 200)).toBe(true);
  expect(await importRowCount(ctx.pool)).toBe(rowsBefore);
}, 60_000);

test('a file over the reading budget is stopped with 422 while health keeps answering', async () => {
  const file = overBudgetFile();
  const { res, answeredBefore, healthStatuses } = await uploadWhilePolling(file);
  expect(res.status).toBe(422);
  expect(file.codes).toContain(res.body.error.code);
  expect(res.body.error.message).toContain(file.name);
  // The read runs for its whole budget (seconds) in a check thread; the event loop serves health meanwhile.
  expect(answeredBefore).toBeGreaterThanOrEqual(3);
  expect(healthStatuses.every((s) => s === 200)).toBe(true);
  // The stopped thread is replaced: a good file reads normally afterwards.
  const ok = await upload(ctx, { text: 'id,name,kind,lat,lon,cpu\nh1,Harbour,edge,55.1,-3.2,4\n', name: 'sites.csv' });
  expect(ok.status).toBe(201);
}, 60_000);
