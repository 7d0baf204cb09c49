// `npm run bench:slots`: how long the slot finder takes, against its targets.
//
// What it does, for each network in turn (the demo network, then a generated one of --sites / --slices, default
// 200 sites / 2,000 slices, seed 1):
//   1. makes a throw-away database, migrates it and seeds it the way db/setup.ts does (bench/api/database.ts);
//   2. picks the work: the busiest site (most slices on or through it) whose search has at least one usable slot.
//      Sites where a critical slice has a function fixed or anchored, and sites whose outage splits the network,
//      are passed over without trying (every slot there strands a critical slice, whatever the night); the others
//      are tried busiest first with a one-night search, and the first with a usable slot is taken;
//   3. quiet calendar: searches 21 nights starting once every tenant can be told in time (tomorrow plus the longest
//      notice any tenant is owed, policy's 7 days at least), allowed hours 00:00–05:00 in the network's zone,
//      4 hours of work, with only the seeded windows booked: most nights share a network state, so the quick
//      re-map runs a few times and is reused for the rest; then the same search again on the warm process;
//   4. busy calendar: books one other draft window per night of the range (through the windows service, as the
//      demo planner), each taking down a different span far from the work that does not clash with it, so every
//      night is a network state of its own and the quick re-map runs about once a night; then searches again;
//   5. the measured searches run their quick re-maps in a worker thread, as the slot jobs do (a thread per search,
//      started on the first re-map the caches cannot answer, so its start-up counts in the first and busy searches);
//   6. prints, for each search, wall time against the target (demo ≤ 10 s, generated ≤ 60 s), the progress as it
//      comes, candidates, usable and excluded by code, quick re-map runs and reused ones, and how the runs ended
//      (stall, generation budget or the time cap), the generations they reached and their wall times; then drops
//      the database, also when a step fails.
// Options: --sites N --slices M --seed S, --demo-only, --generated-only.
import { createDb, type Db } from '../db/client';
import { buildInventory } from '../planner/model/build-inventory';
import { countComponents } from '../planner/impact/bridges';
import type { Inventory } from '../planner/model/types';
import { getUserById, listUsersWithRole } from '../server/queries/auth/users';
import { inventoryCacheFor } from '../server/services/inventory/inventory-cache';
import { threadRemapper } from '../server/jobs/slot-remap-thread';
import type { QuickRemapperFactory } from '../server/services/slots/quick-remap';
import { elementsClash, findSlots, type GroupSlots, type SlotElements } from '../server/services/slots/find-slots';
import { namesOf } from '../server/services/slots/slot-words';
import { processRemapCache } from '../server/services/slots/remap-cache';
import { createWindow } from '../server/services/windows/create-window';
import { FreezeConflictError } from '../server/services/windows/errors';
import { POLICY_DEFAULTS } from '../shared/policies';
import type { Scenario } from '../shared/scenario';
import { slotTimes } from '../shared/slot-times';
import { slotSearchCreateSchema, type SearchProgress, type SlotSearchRequest } from '../shared/slots';
import { NETWORK_TIME_ZONE } from '../shared/time-zone';
import { createBenchDatabase, dropBenchDatabase, seedBenchDatabase } from './api/database';
import { benchScenario } from './api/network';

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

/** How one quick re-map ended, as the bench saw it from outside the thread. */
type RunEnd = { stoppedBy: string; generations: number | null; wallMs: number };

/** The slot jobs' thread remapper, with each run's end written down in `runs` (the bench's own record). */
function recordingRemapper(runs: RunEnd[]): QuickRemapperFactory {
  return (scenario, inventory) => {
    const inner = threadRemapper(scenario, inventory);
    return {
      async remap(req, onBusy) {
        const t0 = Date.now();
        const answer = await inner.remap(req, onBusy);
        runs.push({ stoppedBy: answer.stoppedBy ?? 'nothing to search', generations: answer.generations ?? null, wallMs: Date.now() - t0 });
        return answer;
      },
      close: () => inner.close(),
    };
  };
}

const percentile = (xs: number[], p: number): number => {
  const sorted = [...xs].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))];
};

function reportRuns(runs: RunEnd[]): void {
  if (runs.length === 0) {
    out('    re-maps: none ran (all answered by the caches)');
    return;
  }
  const count = (by: string) => runs.filter((r) => r.stoppedBy === by).length;
  const other = runs.length - count('stall') - count('generations') - count('time');
  const gens = runs.flatMap((r) => (r.generations === null ? [] : [r.generations]));
  const walls = runs.map((r) => r.wallMs);
  out(`    re-maps: ${runs.length} run; ${count('stall')} ended by stall, ${count('generations')} by the generation budget, `
    + `${count('time')} by the time cap${other > 0 ? `, ${other} had nothing to search` : ''}`);
  if (gens.length > 0) out(`    generations reached: p50 ${percentile(gens, 50)}, p95 ${percentile(gens, 95)}, max ${Math.max(...gens)}`);
  out(`    re-map wall time: p50 ${percentile(walls, 50)} ms, p95 ${percentile(walls, 95)} ms, max ${Math.max(...walls)} ms`);
}

function report(label: string, r: GroupSlots, wallMs: number, targetMs: number | null, runs: RunEnd[]): void {
  const s = r.summary;
  const target = targetMs === null ? '' : ` (target ≤ ${targetMs / 1000} s: ${wallMs <= targetMs ? 'met' : 'NOT met'})`;
  out(`  ${label}: wall ${(wallMs / 1000).toFixed(2)} s${target}`);
  out(`    candidates ${r.candidates.length}; usable ${s.usable}; excluded ${s.excluded} (${byCode(r)})`);
  out(`    quick re-map runs ${s.remapRuns} (cap ${s.remapLimitMs} ms each); reused ${s.reusedRuns}; slices touched ${r.touchedSlices.length}`);
  out(`    summary: ${s.remapsCutShort} of the search's re-maps cut short by the time cap`);
  reportRuns(runs);
  runs.length = 0;
  const best = r.candidates[0];
  if (best) out(`    first listed: ${best.start} rank ${best.rank ?? '—'}, cost ${best.cost} points: ${best.explanation}`);
}

type Site = { id: string; name: string; slices: number };

/** Slices on or through each site (a function there or a path over one of its spans: what a site-down window touches). */
function slicesBySite(scenario: Scenario): Map<string, number> {
  const ends = new Map(scenario.spans.map((s) => [s.id, [s.a, s.b]]));
  const count = new Map<string, number>();
  for (const p of scenario.placements) {
    const touched = new Set(Object.values(p.sites));
    for (const path of Object.values(p.paths)) for (const span of path) for (const site of ends.get(span) ?? []) touched.add(site);
    for (const site of touched) count.set(site, (count.get(site) ?? 0) + 1);
  }
  return count;
}

/**
 * Sites worth trying, busiest first, and how many were passed over without trying: those where a critical slice
 * has a function fixed or anchored, and those whose outage splits the network (whatever lies beyond is cut off).
 */
function busySites(scenario: Scenario, inv: Inventory): { sites: Site[]; pinned: number; splitting: number } {
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
  const net = inv.network;
  const base = countComponents(net);
  const splits = (id: string) => {
    const siteDown = new Uint8Array(net.sites.length);
    siteDown[net.siteIndex.get(id)!] = 1;
    return countComponents(net, { siteDown }) > base;
  };
  const count = slicesBySite(scenario);
  const free = scenario.sites.filter((s) => !pinned.has(s.id));
  const sites = free.filter((s) => !splits(s.id))
    .map((s) => ({ id: s.id, name: s.name, slices: count.get(s.id) ?? 0 }))
    .sort((a, b) => b.slices - a.slices || a.id.localeCompare(b.id));
  return { sites, pinned: scenario.sites.length - free.length, splitting: free.length - sites.length };
}

function searchRequest(site: string, from: Date, nights: number): SlotSearchRequest {
  return slotSearchCreateSchema.parse({
    sites: [site], durationHours: 4, hours: { start: '00:00', end: '05:00' },
    from: from.toISOString(), to: new Date(from.getTime() + nights * DAY_MS).toISOString(),
  });
}

/** At most this many sites are tried before the bench gives up looking for one with a usable slot. */
const MAX_PROBES = 15;

/**
 * The busiest site whose one-night search (the range's first night, with the seeded windows) has a usable slot.
 * The probes' quick re-maps are forgotten afterwards, so the measured searches start without them.
 */
async function chooseWork(db: Db, scenario: Scenario, inv: Inventory, from: Date): Promise<Site> {
  const { sites, pinned, splitting } = busySites(scenario, inv);
  out(`  passed over without trying: ${pinned} sites where a critical slice has a function fixed or anchored, `
    + `${splitting} more whose outage splits the network`);
  let chosen: Site | null = null;
  const t0 = Date.now();
  for (const site of sites.slice(0, MAX_PROBES)) {
    const probe = await findSlots(db, searchRequest(site.id, from, 1), { now: new Date() });
    const verdict = probe.summary.usable > 0 ? `${probe.summary.usable} usable of ${probe.candidates.length}` : `none usable (${byCode(probe)})`;
    out(`  one-night probe: ${site.name} (${site.slices} slices on or through it): ${verdict}`);
    if (probe.summary.usable > 0) {
      chosen = site;
      break;
    }
  }
  processRemapCache.clear();
  out(`  probes took ${((Date.now() - t0) / 1000).toFixed(2)} s (the inventory was compiled on the way)`);
  if (chosen) return chosen;
  const fallback = sites[0];
  if (!fallback) throw new Error('no site to take down: every site is pinned by a critical slice or splits the network');
  out(`  no site among the ${MAX_PROBES} busiest has a usable slot on the first night; measuring ${fallback.name} anyway`);
  return fallback;
}

/** Hops from `site` to every site it reaches. */
function hopsFrom(scenario: Scenario, site: string): Map<string, number> {
  const next = new Map<string, string[]>(scenario.sites.map((s) => [s.id, []]));
  for (const s of scenario.spans) {
    next.get(s.a)?.push(s.b);
    next.get(s.b)?.push(s.a);
  }
  const hops = new Map([[site, 0]]);
  const queue = [site];
  for (let i = 0; i < queue.length; i += 1) {
    for (const n of next.get(queue[i]) ?? []) {
      if (hops.has(n)) continue;
      hops.set(n, hops.get(queue[i])! + 1);
      queue.push(n);
    }
  }
  return hops;
}

type OtherSpan = { id: string; label: string; hops: number };

/**
 * `count` spans for the other windows, farthest from the work first (busier spans first among equally far ones):
 * none ends at the work's site, none splits the network on its own, and none clashes with the work (shared element,
 * a split or a stranded slice only both together cause: elementsClash, as the finder's CONFLICT check).
 */
function otherSpans(scenario: Scenario, inv: Inventory, work: SlotElements, count: number): OtherSpan[] {
  const hops = hopsFrom(scenario, work.sites[0]);
  const names = new Map(scenario.sites.map((s) => [s.id, s.name]));
  const words = namesOf(scenario);
  const carried = new Map<string, number>();
  for (const p of scenario.placements) {
    for (const span of new Set(Object.values(p.paths).flat())) carried.set(span, (carried.get(span) ?? 0) + 1);
  }
  const net = inv.network;
  const base = countComponents(net);
  const bridge = (id: string) => {
    const spanDown = new Uint8Array(net.spans.length);
    spanDown[net.spanIndex.get(id)!] = 1;
    return countComponents(net, { spanDown }) > base;
  };
  const far = (id: { a: string; b: string }) => Math.min(hops.get(id.a) ?? Infinity, hops.get(id.b) ?? Infinity);
  const ranked = scenario.spans.filter((s) => far(s) >= 1 && Number.isFinite(far(s)))
    .sort((a, b) => far(b) - far(a) || (carried.get(b.id) ?? 0) - (carried.get(a.id) ?? 0) || a.id.localeCompare(b.id));
  const picked: OtherSpan[] = [];
  for (const s of ranked) {
    if (picked.length === count) break;
    if (bridge(s.id) || elementsClash(inv, work, { sites: [], spans: [s.id] }, words).length > 0) continue;
    picked.push({ id: s.id, label: `the span between ${names.get(s.a) ?? s.a} and ${names.get(s.b) ?? s.b}`, hops: far(s) });
  }
  return picked;
}

/**
 * One other draft window per night of the search, over the night's whole allowed period, each taking down a
 * different span (otherSpans), booked through the windows service as the demo planner. Answers the windows' ids.
 */
async function bookBusyCalendar(db: Db, scenario: Scenario, inv: Inventory, work: SlotElements, request: SlotSearchRequest): Promise<Set<string>> {
  const nights = new Map<string, { startMs: number; endMs: number }>();
  for (const t of slotTimes(request, NETWORK_TIME_ZONE)) {
    const n = nights.get(t.night);
    nights.set(t.night, n ? { startMs: Math.min(n.startMs, t.startMs), endMs: Math.max(n.endMs, t.endMs) } : { startMs: t.startMs, endMs: t.endMs });
  }
  const spans = otherSpans(scenario, inv, work, nights.size);
  if (spans.length < nights.size) out(`    only ${spans.length} spans qualify for ${nights.size} nights: the last nights stay quiet`);
  const [contact] = await listUsersWithRole(db, 'planner');
  const planner = contact ? await getUserById(db, { id: contact.id }) : null;
  if (!planner) throw new Error('the seeded database has no planner to book the other windows');
  const ids = new Set<string>();
  const hops: number[] = [];
  for (const [i, [night, times]] of [...nights].entries()) {
    const span = spans[i];
    if (!span) break;
    try {
      ids.add(await createWindow(db, {
        title: `Fibre work on ${span.label}`, startsAt: new Date(times.startMs).toISOString(),
        endsAt: new Date(times.endMs).toISOString(), workType: 'Bench',
        elements: [{ kind: 'span', id: span.id, effect: 'down' }],
      }, planner, new Date()));
      hops.push(span.hops);
    } catch (err) {
      if (!(err instanceof FreezeConflictError)) throw err;
      out(`    ${night}: inside a freeze, left without another window`);
    }
  }
  out(`    booked ${ids.size} other draft windows, one a night, each taking down a different span `
    + `${Math.min(...hops)}–${Math.max(...hops)} hops from the work's site`);
  return ids;
}

async function benchNetwork(name: string, demo: boolean, o: Options, targetMs: number): Promise<void> {
  const dbName = `slackwater_bench_slots_${process.pid}`;
  const scenario = benchScenario({ demo, sites: o.sites, slices: o.slices, seed: o.seed });
  const inv = buildInventory(scenario);
  out(`bench:slots — ${name}: ${scenario.sites.length} sites, ${scenario.slices.length} slices`);
  const url = createBenchDatabase(dbName);
  const { db, pool } = createDb(url, { max: 4 });
  try {
    const rows = await seedBenchDatabase(url, scenario);
    out(`  seeded ${rows.windows ?? 0} windows`);
    const leadDays = Math.max(POLICY_DEFAULTS.noticeLeadDays, ...scenario.tenants.map((t) => t.noticeDays));
    const from = new Date((Math.ceil(Date.now() / DAY_MS) + leadDays) * DAY_MS);
    const site = await chooseWork(db, scenario, inv, from);
    const request = searchRequest(site.id, from, NIGHTS);
    out(`  work: 4 hours taking ${site.name} down (${site.slices} slices on or through it), the busiest site with a usable slot; `
      + `${NIGHTS} nights from ${request.from.slice(0, 10)} (${leadDays} days ahead: the longest notice owed), 00:00–05:00`);
    const progress = (p: SearchProgress) => out(`    progress: ${p.phase} ${p.done}/${p.total} at ${(p.elapsedMs / 1000).toFixed(2)} s`);

    out('  quiet calendar (the seeded windows only):');
    const runs: RunEnd[] = [];
    const remapper = recordingRemapper(runs);
    let t0 = Date.now();
    const quiet = await findSlots(db, request, { now: new Date(), onProgress: progress, remapper });
    report('first search', quiet, Date.now() - t0, targetMs, runs);
    t0 = Date.now();
    const warm = await findSlots(db, request, { now: new Date(), remapper });
    report('same search again (warm process)', warm, Date.now() - t0, null, runs);

    out('  busy calendar (another window every night):');
    const booked = await bookBusyCalendar(db, scenario, inv, { sites: [site.id], spans: [] }, request);
    t0 = Date.now();
    const busy = await findSlots(db, request, { now: new Date(), onProgress: progress, remapper });
    report('search', busy, Date.now() - t0, targetMs, runs);
    const clashing = busy.candidates.filter((c) => c.excluded?.code === 'CONFLICT' && c.conflicts.some((x) => booked.has(x.id)));
    const alongside = busy.candidates.filter((c) => c.overlapping.some((w) => booked.has(w.id))).length;
    out(`    ${alongside} of ${busy.candidates.length} candidates overlap one of the other windows; `
      + `${clashing.length} of them excluded as CONFLICT with it`);
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
