// `npm run bench:api`: how the API answers on a big inventory, against the scale targets.
//
// What it does, in order:
//   1. makes a throw-away database (scripts/pg.sh), migrates it and seeds the demo accounts and policies the way
//      db/setup.ts does, with a network from buildScenario (default 1,000 sites / 20,000 slices, seed 1) or,
//      with --demo, the demo network;
//   2. starts the API server as a child process (plan worker in the process) and waits for /api/ready;
//   3. signs in as the demo planner (and the tenant user for one tenant-scoped list), books three windows
//      through the API: one on the busiest site (most slices touched), one overlapping it in time on a span next
//      to it, and the plan window on a site touching about 6.5 % of all slices (the big window the scale targets
//      were set on touched 1,313 of 20,000);
//   4. times every list, detail and map route, the window list / detail / conflicts / impact and assessing the
//      busiest window: one warm-up, then p50 / p95 of 20 sequential requests (a route stops early after 60 s);
//   5. runs 10 concurrent clients for 20 s over the list routes and the window's impact: requests/s, p50,
//      p99, errors;
//   6. times the scenario and GraphML exports (first byte and total, uncompressed, median of 3);
//   7. starts one plan run on the plan window with the default settings and polls it to the end: generations,
//      the search's unresolved slices against greedy's, total time against the limit;
//   8. throughout, samples the server's resident memory (VmRSS in /proc/<pid>/status) every 250 ms: the
//      highest while serving (steps 4–6) and while planning (step 7).
// It prints one table (figure | measured | target | met), then drops the database and stops the server, also
// when a step fails.
import { ApiClient } from './api/client';
import { createBenchDatabase, dropBenchDatabase, seedBenchDatabase } from './api/database';
import { concurrentLoad, timeExportMedian, timeRoute, type Route, type RouteTiming } from './api/measure';
import { benchScenario, windowTargets, type WindowTargets } from './api/network';
import { freePort, parseOptions, type BenchOptions } from './api/options';
import { runPlan } from './api/plan-run';
import {
  ASSESS_P95_TARGET_MS, exportRows, loadRows, planRows, printTable, ROUTE_P95_TARGET_MS, routeRow, rssRows, type Row,
} from './api/report';
import { sampleRss, startServer, type BenchServer } from './api/server';
import { bookWindows, windowListRange, type BenchWindows } from './api/windows';
import { DEMO_PASSWORD, DEMO_USERS } from '../db/seed/demo-users';

const SEQUENTIAL_REQUESTS = 20;
const ROUTE_BUDGET_MS = 60_000;
const CONCURRENT_CLIENTS = 10;
const CONCURRENT_SECONDS = 20;
const EXPORT_RUNS = 3;

const log = (line: string) => process.stderr.write(`bench:api: ${line}\n`);
const emailOf = (role: string) => DEMO_USERS.find((u) => u.role === role)!.email;
const enc = encodeURIComponent;

/** Work to undo at the end, last first; runs once even if a signal and the normal end both ask for it. */
function cleanupList() {
  const steps: { what: string; run: () => Promise<void> }[] = [];
  let done: Promise<void> | null = null;
  const runAll = async () => {
    for (const step of steps.reverse()) {
      await step.run().catch((err: unknown) => log(`could not ${step.what}: ${err instanceof Error ? err.message : String(err)}`));
    }
  };
  return {
    add: (what: string, run: () => Promise<void>) => { steps.push({ what, run }); },
    run: () => (done ??= runAll()),
  };
}

function sequentialRoutes(planner: ApiClient, tenant: ApiClient, targets: WindowTargets, windows: BenchWindows): Route[] {
  const { from, to } = windowListRange();
  const get = (label: string, path: string, client = planner): Route => ({ label, client, method: 'GET', path });
  return [
    get('slices list (50)', '/api/slices?pageSize=50'),
    get('slices list (50), tenant user', '/api/slices?pageSize=50', tenant),
    get('sites list (50)', '/api/sites?pageSize=50'),
    get('spans list (50)', '/api/spans?pageSize=50'),
    get('network map', '/api/network/map'),
    get('slice detail', `/api/slices/${enc(targets.slice)}`),
    get('site detail (busiest site)', `/api/sites/${enc(targets.busiestSite.id)}`),
    get('window list', `/api/windows?from=${enc(from)}&to=${enc(to)}`),
    get('window detail', `/api/windows/${enc(windows.busiest)}`),
    get('window conflicts (overlapping windows)', `/api/windows/${enc(windows.busiest)}/conflicts`),
    get('window impact', `/api/windows/${enc(windows.busiest)}/impact`),
  ];
}

/** The concurrent mix: the list routes on a few pages, and the busiest window's impact. */
function loadMix(routes: Route[], planner: ApiClient, windows: BenchWindows): Route[] {
  const lists = routes.filter((r) => r.label.includes('list'));
  const pages = [2, 3].map((page): Route => ({ label: `slices page ${page}`, client: planner, method: 'GET', path: `/api/slices?pageSize=50&page=${page}` }));
  const impact: Route = { label: 'window impact', client: planner, method: 'GET', path: `/api/windows/${enc(windows.busiest)}/impact` };
  return [...lists, ...pages, impact, impact];
}

async function signedIn(baseUrl: string, role: string): Promise<ApiClient> {
  const client = new ApiClient(baseUrl);
  await client.signIn(emailOf(role), DEMO_PASSWORD);
  return client;
}

async function measureAll(server: BenchServer, targets: WindowTargets): Promise<Row[]> {
  const rss = sampleRss(server.pid);
  const planner = await signedIn(server.baseUrl, 'planner');
  const tenant = await signedIn(server.baseUrl, 'tenant');
  log('booking and assessing the windows');
  const windows = await bookWindows(planner, targets);
  rss.phase('serving');
  const routes = sequentialRoutes(planner, tenant, targets, windows);
  const timings: RouteTiming[] = [];
  for (const route of routes) {
    log(`timing ${route.label}`);
    timings.push(await timeRoute(route, SEQUENTIAL_REQUESTS, ROUTE_BUDGET_MS));
  }
  log(`timing assessing the busiest window (${windows.busiestTouched} slices touched)`);
  const assess = await timeRoute({ label: `assess the busiest site's window (${windows.busiestTouched.toLocaleString('en-GB')} slices touched)`, client: planner,
    method: 'POST', path: `/api/windows/${enc(windows.busiest)}/assess`, body: {} }, SEQUENTIAL_REQUESTS, ROUTE_BUDGET_MS);
  log(`${CONCURRENT_CLIENTS} concurrent clients for ${CONCURRENT_SECONDS} s`);
  const load = await concurrentLoad(loadMix(routes, planner, windows), CONCURRENT_CLIENTS, CONCURRENT_SECONDS);
  for (const r of load.byRoute) log(`  under load: ${r.label}: ${r.requests} answers, p50 ${Math.round(r.p50)} ms`);
  log('timing the exports');
  const scenarioExport = await timeExportMedian(planner, '/api/export/scenario', EXPORT_RUNS);
  const graphmlExport = await timeExportMedian(planner, '/api/export/graphml', EXPORT_RUNS);
  rss.phase('planning');
  log(`plan run on the plan window (${windows.planTouched} slices touched), default settings`);
  const plan = await runPlan(planner, windows.plan, windows.planTouched);
  rss.stop();
  return [
    ...timings.map((t) => routeRow(t, ROUTE_P95_TARGET_MS)),
    routeRow(assess, ASSESS_P95_TARGET_MS),
    ...loadRows(load, CONCURRENT_CLIENTS),
    ...exportRows(scenarioExport, graphmlExport, EXPORT_RUNS),
    ...planRows(plan, targets.planSite.name),
    ...rssRows(rss.maxBytes('serving'), rss.maxBytes('planning')),
  ];
}

function describe(o: BenchOptions, rows: Record<string, number>, targets: WindowTargets): string {
  const network = o.demo ? 'demo network' : `buildScenario seed ${o.seed}`;
  const n = (k: string) => (rows[k] ?? 0).toLocaleString('en-GB');
  return `bench:api — ${network}: ${n('sites')} sites, ${n('spans')} spans, ${n('tenants')} tenants, ${n('slices')} slices, ` +
    `${n('functions')} functions, ${n('ties')} ties, ${n('windows')} seeded windows; busiest site ${targets.busiestSite.name} ` +
    `(${targets.busiestSite.slices.toLocaleString('en-GB')} slices on or through it)`;
}

async function main(): Promise<void> {
  const options = parseOptions(process.argv.slice(2));
  const cleanup = cleanupList();
  const stopOnSignal = (signal: NodeJS.Signals) => {
    log(`${signal}: cleaning up`);
    void cleanup.run().then(() => process.exit(130));
  };
  process.once('SIGINT', stopOnSignal);
  process.once('SIGTERM', stopOnSignal);
  const dbName = `slackwater_bench_api_${process.pid}`;
  try {
    log(`building the network (${options.demo ? 'demo' : `${options.sites} sites / ${options.slices} slices`})`);
    const scenario = benchScenario(options);
    const targets = windowTargets(scenario);
    cleanup.add(`drop database ${dbName}`, () => dropBenchDatabase(dbName));
    const url = createBenchDatabase(dbName);
    log(`seeding ${dbName}`);
    const seeded = await seedBenchDatabase(url, scenario);
    const server = await startServer(url, options.port ?? (await freePort()));
    cleanup.add('stop the server', server.stop);
    log(`server ready at ${server.baseUrl} (pid ${server.pid}, log ${server.logPath})`);
    const rows = await measureAll(server, targets);
    printTable(describe(options, seeded, targets), rows);
  } finally {
    await cleanup.run();
  }
}

main().catch((err: unknown) => {
  console.error(`bench:api failed: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
