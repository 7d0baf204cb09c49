// Fuzz over every route (read from the app's router) as an admin and a planner: hostile path values, queries,
// JSON bodies and odd body headers never answer 5xx, and a refused (4xx) request leaves every table as it was.
import fc from 'fast-check';
import request from 'supertest';
import { insertNetworkFixture } from '../helpers/network-fixture';
import { createRecordingQueue } from '../helpers/jobs';
import { useScratchDatabase } from '../helpers/scratch-database';
import { signInAs } from '../helpers/sign-in';
import { setupTestApp, type TestContext } from '../helpers/test-app';
import { checksum, tableNames } from './db-checksum';
import { jsonBody, oddBody, pathValue, queryString, type OddBody } from './inputs';
import { listRoutes, paramsOf, type RouteInfo } from './routes';

jest.setTimeout(180_000);

/** Routes that end the fuzzing session itself; refusing them is covered by their own suites. */
const SKIPPED = [/\/auth\/sign-out$/, /\/me\/sessions\/revoke-all$/, /\/me\/sessions\/:id$/];
const ROLES = ['admin', 'planner'] as const;
type Role = (typeof ROLES)[number];
/** A failed sign-in is recorded by design (limits, audit), so its refusal may write; every other refusal may not. */
const WRITES_WHEN_REFUSED = /\/auth\/sign-in$/;
/**
 * The network fixture's slices have no functions (it is built row by row, not imported), so the export's own check
 * answers its designed 500 EXPORT_INVALID for the stored data whatever the request; counted apart, not as a failure.
 */
const FIXTURE_500 = new Map([['GET /api/export/scenario', 'EXPORT_INVALID']]);
const SEED = Number(process.env.FUZZ_SEED ?? 20_251_113);

let ctx: TestContext;
let tables: string[];
let realIds: string[];
const cookies = new Map<Role, string>();
const figures = { inputs: 0, fiveXx: 0, fixture500: 0, refused: 0, accepted: 0, checksums: 0, checksumMs: 0, routes: 0, combos: new Set<string>() };
const failures: string[] = [];

beforeAll(async () => {
  await useScratchDatabase('fuzz');
  ctx = await setupTestApp();
  ctx.app = ctx.makeApp({ jobs: createRecordingQueue(), log: () => undefined });
  const now = new Date();
  const { id } = await insertNetworkFixture(ctx.db, { prefix: ctx.prefix, ownTenantId: ctx.tenantId, now });
  realIds = [id('transit-b'), id('shared-c'), id('A'), id('k1'), id('own-slice'), ctx.users.engineer.id, ctx.tenantId, 'csv-sites'];
  tables = await tableNames(ctx.pool);
  for (const role of ROLES) cookies.set(role, await signInAs(ctx.app, ctx.users[role].email));
}, 120_000);

afterAll(async () => {
  console.log([
    `fuzz: ${figures.routes} routes × ${ROLES.length} roles = ${figures.combos.size} route×role pairs checked`,
    `inputs generated ${figures.inputs}, answers 5xx ${figures.fiveXx} (+ ${figures.fixture500} EXPORT_INVALID on the fixture), refused 4xx ${figures.refused}, accepted ${figures.accepted}`,
    `table checksums taken ${figures.checksums} (${figures.checksumMs} ms in all) over ${tables?.length ?? 0} tables (seed ${SEED})`,
  ].join('\n'));
  await ctx?.close();
});

type Input = { role: Role; params: string[]; query: string; body: unknown; odd: OddBody | null };

function buildPath(route: RouteInfo, params: string[]): string {
  let i = 0;
  return route.pattern.replace(/:(\w+)/g, () => params[i++] ?? 'x');
}

async function send(route: RouteInfo, input: Input): Promise<request.Response> {
  const url = `${buildPath(route, input.params)}${input.query ? `?${input.query}` : ''}`;
  const req = request(ctx.app)[route.method.toLowerCase() as 'get'](url).set('Cookie', cookies.get(input.role)!);
  if (route.method === 'GET') return req;
  // Sent as text so any JSON value (a bare number, a string with a lone surrogate) arrives as generated.
  if (!input.odd) return req.set('Content-Type', 'application/json').serialize((b: string) => b).send(JSON.stringify(input.body));
  const { contentType, contentEncoding, bytes } = input.odd;
  const withType = req.set('Content-Type', contentType).serialize((b: string) => b);
  return (contentEncoding ? withType.set('Content-Encoding', contentEncoding) : withType).send(bytes);
}

/** Routes that answer first and finish their work after: POST /api/auth/forgot-password (its answer may not
 *  depend on whether the address exists). */
const FINISHES_AFTER_ANSWER = /\/auth\/forgot-password$/;

async function countResetRequests(): Promise<number> {
  const res = await ctx.pool.query<{ n: number }>("select count(*)::int as n from audit_log where action = 'password-reset-requested'");
  return res.rows[0].n;
}

/** Polls until the request's audit row is written (every reset request writes one, mail or not). */
async function untilResetRequestsExceed(before: number): Promise<void> {
  for (let i = 0; i < 200; i++) {
    if ((await countResetRequests()) > before) return;
    await new Promise((resolve) => setTimeout(resolve, 25));
  }
  throw new Error('a password reset request never finished its work');
}

/** Sends one input; a 5xx is a failure, and after a 4xx every table must match the checksum from before. */
async function check(route: RouteInfo, input: Input, baseline: { sum: string }): Promise<void> {
  figures.inputs++;
  figures.combos.add(`${route.method} ${route.pattern} ${input.role}`);
  const resetRequests = FINISHES_AFTER_ANSWER.test(route.pattern) ? await countResetRequests() : 0;
  const res = await send(route, input);
  // A reset request is answered before its work (look-up, link, mail, audit row) is done; that work must land
  // before the checksum, or it shows up as a change made by the next, refused request.
  if (res.status < 400 && FINISHES_AFTER_ANSWER.test(route.pattern)) await untilResetRequestsExceed(resetRequests);
  if (res.status === 500 && FIXTURE_500.get(`${route.method} ${route.pattern}`) === res.body?.error?.code) {
    figures.fixture500++;
    return;
  }
  if (res.status >= 500) {
    figures.fiveXx++;
    failures.push(`${res.status} ${route.method} ${route.pattern} as ${input.role}: ${JSON.stringify(res.body).slice(0, 200)}`);
    return;
  }
  const started = Date.now();
  const after = await checksum(ctx.pool, tables);
  figures.checksumMs += Date.now() - started;
  figures.checksums++;
  if (res.status >= 400) {
    figures.refused++;
    if (after !== baseline.sum && !WRITES_WHEN_REFUSED.test(route.pattern)) failures.push(`${res.status} ${route.method} ${route.pattern} changed the data`);
  } else {
    figures.accepted++;
  }
  baseline.sum = after;
  // A refused request may have ended the session (401): sign in again so the rest still reaches the handlers.
  if (res.status === 401 && !WRITES_WHEN_REFUSED.test(route.pattern)) {
    cookies.set(input.role, await signInAs(ctx.app, ctx.users[input.role].email));
    baseline.sum = await checksum(ctx.pool, tables);
  }
}

function inputFor(route: RouteInfo): fc.Arbitrary<Input> {
  const n = paramsOf(route.pattern).length;
  return fc.record({
    role: fc.constantFrom(...ROLES),
    params: fc.array(pathValue(realIds), { minLength: n, maxLength: n }),
    query: route.method === 'GET' ? queryString(realIds) : fc.constant(''),
    body: route.method === 'GET' ? fc.constant(undefined) : jsonBody(realIds),
    odd: route.method === 'GET' ? fc.constant(null) : fc.option(oddBody, { freq: 3, nil: null }),
  });
}

test('every route as admin and planner: hostile inputs never answer 5xx and a refused request changes no table', async () => {
  const routes = listRoutes(ctx.app).filter((r) => !SKIPPED.some((re) => re.test(r.pattern)));
  figures.routes = routes.length;
  expect(routes.length).toBeGreaterThan(30);
  const baseline = { sum: await checksum(ctx.pool, tables) };
  // Every route gets the same share; a GET without parameters has little to vary, so it gets fewer.
  for (const [index, route] of routes.entries()) {
    const hasInput = route.method !== 'GET' || paramsOf(route.pattern).length > 0;
    await fc.assert(fc.asyncProperty(inputFor(route), (input) => check(route, input, baseline)),
      { numRuns: hasInput ? 24 : 8, seed: SEED + index, endOnFailure: true });
  }
  expect(failures).toEqual([]);
  expect(figures.fiveXx).toBe(0);
  expect(figures.inputs).toBeGreaterThanOrEqual(1000);
});
