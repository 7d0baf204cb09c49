// `npm run bench:slots`: how long the slot finder takes, against its targets.
//
// What it does, for each network in turn (the demo network, then a generated one of --sites / --slices, default
// 200 sites / 2,000 slices, seed 1):
//   1. makes a throw-away database, migrates it and seeds it the way db/setup.ts does (bench/api/database.ts);
//   2. searches 21 nights starting once every tenant can be told in time (tomorrow plus the longest notice any
//      tenant is owed, policy's 7 days at least, so the nights reach the quick re-map), allowed hours 00:00–05:00 in the network's zone, 4 hours of work taking
//      a busy site down (the site with most slices on or through it among those where no critical slice has a
//      function fixed or anchored and whose outage does not split the network: at those every slot strands a
//      critical slice, whatever the night), in
//      this process, printing progress as it comes;
//   3. runs the same search again on the warm process (inventory compiled, quick re-maps cached);
//   4. prints wall time against the target (demo ≤ 10 s, generated ≤ 60 s), candidates, usable and excluded by
//      code, quick re-map runs and reused ones; then drops the database, also when a step fails.
// Options: --sites N --slices M --seed S, --demo-only, --generated-only.
import { createDb } from '../db/client';
import { inventoryCacheFor } from '../server/services/inventory/inventory-cache';
import { findSlots, type GroupSlots } from '../server/services/slots/find-slots';
import { POLICY_DEFAULTS } from '../shared/policies';
import { slotSearchCreateSchema, type SearchProgress } from '../shared/slots';
import { createBenchDatabase, dropBenchDatabase, seedBenchDatabase } from './api/database';
import { countComponents } from '../planner/impact/bridges';
import { buildInventory } from '../planner/model/build-inventory';
import type { Scenario } from '../shared/scenario';
import { benchScenario, windowTargets } from './api/network';

const NIGHTS = 21;
const DEMO_TARGET_MS = 10_000;
const GENERATED_TARGET_MS = 60_000;
const DAY_MS = 86_400_000;

const out = (line: string): void => { process.stdout.write(`${line}\n`); };

type Options = { sites: number; slices: number; seed: number; demo: boolean; generated: boolean };

function parseOptions(args: string[]): Options {
  const o: Options = { sites: 200, slices: 2000, seed: 1, demo: true, generated: true };
  const whole = (flag: string, v: string | undefined) => {
    const n = Number(v);
    if (!Number.isInteger(n) || n < 1) throw new Error(`${flag} needs a whole number ≥ 1`);
    return n;
  };
  for (let i = 0; i < args.length; i += 1) {
    const flag = args[i];
    if (flag === '--sites') o.sites = whole(flag, args[++i]);
    else if (flag === '--slices') o.slices = whole(flag, args[++i]);
    else if (flag === '--seed') o.seed = whole(flag, args[++i]);
    else if (flag === '--demo-only') o.generated = false;
    else if (flag === '--generated-only') o.demo = false;
    else throw new Error(`unknown option ${flag}\nusage: npm run bench:slots -- [--sites N --slices M] [--seed S] [--demo-only | --generated-only]`);
  }
  return o;
}

function byCode(r: GroupSlots): string {
  const counts = new Map<string, number>();
  for (const c of r.candidates) if (c.excluded) counts.set(c.excluded.code, (counts.get(c.excluded.code) ?? 0) + 1);
  return counts.size === 0 ? 'none' : [...counts].map(([code, n]) => `${code} ${n}`).join(', ');
}

function report(label: string, r: GroupSlots, wallMs: number, targetMs: number | null): void {
  const s = r.summary;
  const target = targetMs === null ? '' : ` (target ≤ ${targetMs / 1000} s: ${wallMs <= targetMs ? 'met' : 'NOT met'})`;
  out(`  ${label}: wall ${(wallMs / 1000).toFixed(2)} s${target}`);
  out(`    candidates ${r.candidates.length}; usable ${s.usable}; excluded ${s.excluded} (${byCode(r)})`);
  out(`    quick re-map runs ${s.remapRuns} of ${s.remapLimitMs} ms each; reused ${s.reusedRuns}; slices touched ${r.touchedSlices.length}`);
  const best = r.candidates[0];
  if (best) out(`    first listed: ${best.start} rank ${best.rank ?? '—'}, cost ${best.cost} points: ${best.explanation}`);
}

/** Sites by slices on or through them (as bench:api counts them), busiest first, skipping pinned critical work. */
function busySite(scenario: Scenario): { id: string; name: string; slices: number } {
  const pinned = new Set<string>();
  const placed = new Map(scenario.placements.map((p) => [p.slice, p.sites]));
  for (const slice of scenario.slices.filter((s) => s.critical)) {
    for (const f of slice.functions) {
      const anchor = f.anchor && 'site' in f.anchor ? f.anchor.site : null;
      const at = placed.get(slice.id)?.[f.id];
      if (anchor) pinned.add(anchor);
      if (f.fixed && at) pinned.add(at);
    }
  }
  const ends = new Map(scenario.spans.map((s) => [s.id, [s.a, s.b]]));
  const count = new Map<string, number>();
  for (const p of scenario.placements) {
    const touched = new Set(Object.values(p.sites));
    for (const path of Object.values(p.paths)) for (const span of path) for (const site of ends.get(span) ?? []) touched.add(site);
    for (const site of touched) count.set(site, (count.get(site) ?? 0) + 1);
  }
  // A site whose outage splits the network cuts off whatever lies beyond it: no slot can help there either.
  const net = buildInventory(scenario).network;
  const base = countComponents(net);
  const splits = (id: string) => {
    const siteDown = new Uint8Array(net.sites.length);
    siteDown[net.siteIndex.get(id)!] = 1;
    return countComponents(net, { siteDown }) > base;
  };
  const site = scenario.sites.filter((s) => !pinned.has(s.id) && !splits(s.id))
    .sort((a, b) => (count.get(b.id) ?? 0) - (count.get(a.id) ?? 0) || a.id.localeCompare(b.id))[0]
    ?? windowTargets(scenario).busiestSite;
  return { id: site.id, name: site.name, slices: count.get(site.id) ?? 0 };
}

async function benchNetwork(name: string, demo: boolean, o: Options, targetMs: number): Promise<void> {
  const dbName = `slackwater_bench_slots_${process.pid}`;
  const scenario = benchScenario({ demo, sites: o.sites, slices: o.slices, seed: o.seed });
  const site = busySite(scenario);
  out(`bench:slots — ${name}: ${scenario.sites.length} sites, ${scenario.slices.length} slices; work takes ${site.name} down `
    + `(${site.slices} slices on or through it)`);
  const url = createBenchDatabase(dbName);
  const { db, pool } = createDb(url, { max: 4 });
  try {
    const rows = await seedBenchDatabase(url, scenario);
    out(`  seeded ${rows.windows ?? 0} windows`);
    const leadDays = Math.max(POLICY_DEFAULTS.noticeLeadDays, ...scenario.tenants.map((t) => t.noticeDays));
    const from = new Date((Math.ceil(Date.now() / DAY_MS) + leadDays) * DAY_MS);
    const request = slotSearchCreateSchema.parse({
      sites: [site.id], durationHours: 4, hours: { start: '00:00', end: '05:00' },
      from: from.toISOString(), to: new Date(from.getTime() + NIGHTS * DAY_MS).toISOString(),
    });
    out(`  ${NIGHTS} nights from ${request.from.slice(0, 10)} (${leadDays} days ahead: the longest notice owed)`);
    const progress = (p: SearchProgress) => out(`    progress: ${p.phase} ${p.done}/${p.total} at ${(p.elapsedMs / 1000).toFixed(2)} s`);
    let t0 = Date.now();
    const cold = await findSlots(db, request, { now: new Date(), onProgress: progress });
    report('first search (inventory compiled on the way)', cold, Date.now() - t0, targetMs);
    t0 = Date.now();
    const warm = await findSlots(db, request, { now: new Date() });
    report('same search again (warm process)', warm, Date.now() - t0, null);
  } finally {
    await inventoryCacheFor(db).close();
    await pool.end();
    await dropBenchDatabase(dbName);
  }
}

async function main(): Promise<void> {
  const o = parseOptions(process.argv.slice(2));
  if (o.demo) await benchNetwork('demo network', true, o, DEMO_TARGET_MS);
  if (o.generated) await benchNetwork(`generated network (seed ${o.seed})`, false, o, GENERATED_TARGET_MS);
}

main().catch((err: unknown) => {
  process.stderr.write(`bench:slots failed: ${err instanceof Error ? err.stack ?? err.message : String(err)}\n`);
  process.exit(1);
});
