// Real-shape benchmark scenarios: valid, deterministic, connected, heavy-tailed, fibre-like spans, and scarce
// capacity around their window — the last checked with reference libraries (dijkstrajs, @turf/distance),
// not with the generator's own detour code — and a knock-on gate that HiGHS proves needs a knock-on move.
import turfDistance from '@turf/distance';
import dijkstra from 'dijkstrajs';
import { exactPlan } from '../../../planner/exact/exact-plan';
import { buildRealShapeScenario } from '../../../scenarios/generate/real-shape-scenario';
import { buildInventory, compileWindow } from '../../../planner/model/build-inventory';
import { buildRemapProblem } from '../../../planner/remap/problem';
import { scenarioSchema, type Scenario } from '../../../shared/scenario';
import { validateScenario } from '../../../shared/scenario-validate';

const SIZES = [
  { sites: 40, slices: 100, seed: 1 },
  { sites: 120, slices: 200, seed: 2 },
  { sites: 200, slices: 300, seed: 3 },
];
const built = new Map(SIZES.map((o) => [o, buildRealShapeScenario(o)]));
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const km = (sc: Scenario, a: string, b: string) => {
  const [p, q] = [sc.sites.find((s) => s.id === a)!, sc.sites.find((s) => s.id === b)!];
  return turfDistance([p.lon, p.lat], [q.lon, q.lat], { units: 'kilometers' });
};

function degrees(sc: Scenario): number[] {
  const d = new Map(sc.sites.map((s) => [s.id, 0]));
  for (const s of sc.spans) {
    d.set(s.a, d.get(s.a)! + 1);
    d.set(s.b, d.get(s.b)! + 1);
  }
  return [...d.values()];
}

function connected(sc: Scenario): boolean {
  const graph: Record<string, Record<string, number>> = Object.fromEntries(sc.sites.map((s) => [s.id, {}]));
  for (const s of sc.spans) graph[s.a][s.b] = graph[s.b][s.a] = s.lengthKm;
  const reach = dijkstra.single_source_shortest_paths(graph, sc.sites[0].id);
  return sc.sites.every((s) => s.id === sc.sites[0].id || s.id in reach);
}

/**
 * Peak span utilisation with the window's elements down and every touched slice on its shortest surviving
 * path (a function on the down site moved to the nearest up site its anchor allows), from the scenario alone.
 */
function referenceLoads(sc: Scenario): { now: Map<string, number>; during: Map<string, number>; up: Scenario['spans'] } {
  const w = sc.windows![0];
  const downSite = new Set(w.down.sites);
  const up = sc.spans.filter((s) => !w.down.spans.includes(s.id) && !downSite.has(s.a) && !downSite.has(s.b));
  const graph: Record<string, Record<string, number>> = Object.fromEntries(sc.sites.filter((s) => !downSite.has(s.id)).map((s) => [s.id, {}]));
  const spanOf = new Map<string, string>();
  for (const s of up) {
    graph[s.a][s.b] = graph[s.b][s.a] = s.lengthKm * 0.005;
    spanOf.set(`${s.a}|${s.b}`, s.id).set(`${s.b}|${s.a}`, s.id);
  }
  const load = new Map<string, number>();
  const now = new Map<string, number>();
  const add = (span: string, gbps: number) => load.set(span, (load.get(span) ?? 0) + gbps);
  const isUp = new Set(up.map((s) => s.id));
  sc.slices.forEach((slice, i) => {
    const p = sc.placements[i];
    slice.ties.forEach((t) => p.paths[t.id].forEach((s) => now.set(s, (now.get(s) ?? 0) + t.bandwidthGbps)));
    const touched = Object.values(p.sites).some((s) => downSite.has(s)) || Object.values(p.paths).some((path) => path.some((s) => !isUp.has(s)));
    if (!touched) return slice.ties.forEach((t) => p.paths[t.id].forEach((s) => add(s, t.bandwidthGbps)));
    const site: Record<string, string> = {};
    for (const f of slice.functions) {
      const now = p.sites[f.id];
      if (!downSite.has(now)) site[f.id] = now;
      else if (!f.fixed && !(f.anchor && 'site' in f.anchor)) {
        const fits = sc.sites.filter((s) => !downSite.has(s.id) && (!f.anchor || !('lat' in f.anchor) || turfDistance([s.lon, s.lat], [f.anchor.lon, f.anchor.lat], { units: 'kilometers' }) <= f.anchor.radiusKm));
        site[f.id] = fits.sort((a, b) => km(sc, now, a.id) - km(sc, now, b.id))[0].id;
      }
    }
    if (Object.keys(site).length < slice.functions.length) return; // stranded: no way round
    for (const t of slice.ties) {
      const keep = site[t.from] === p.sites[t.from] && site[t.to] === p.sites[t.to] && p.paths[t.id].every((s) => isUp.has(s));
      if (keep) p.paths[t.id].forEach((s) => add(s, t.bandwidthGbps));
      else {
        const nodes = site[t.from] === site[t.to] ? [site[t.from]] : dijkstra.find_path(graph, site[t.from], site[t.to]);
        for (let k = 1; k < nodes.length; k += 1) add(spanOf.get(`${nodes[k - 1]}|${nodes[k]}`)!, t.bandwidthGbps);
      }
    }
  });
  return { now, during: load, up };
}

function referencePeak(sc: Scenario): number {
  const { during, up } = referenceLoads(sc);
  return Math.max(...up.map((s) => (during.get(s.id) ?? 0) / s.capacityGbps));
}

describe.each(SIZES)('buildRealShapeScenario ($sites sites, $slices slices, seed $seed)', (size) => {
  const r = built.get(size)!;
  const sc = r.scenario;

  it('is a valid slackwater-scenario/1 with no warnings (capacity, anchors, latency budgets all met today)', () => {
    const plain = JSON.parse(JSON.stringify(sc));
    expect(scenarioSchema.safeParse(plain).success).toBe(true);
    const v = validateScenario(plain);
    expect(v.ok ? v.warnings : v.errors).toEqual([]);
    expect(sc.sites).toHaveLength(size.sites);
    expect(sc.slices).toHaveLength(size.slices);
  });

  it('is deterministic per seed', () => {
    expect(buildRealShapeScenario(size)).toEqual(r);
    expect(buildRealShapeScenario({ ...size, seed: size.seed + 100 }).scenario.spans).not.toEqual(sc.spans);
  });

  it('is connected with a heavy-tailed degree distribution (max ≥ 3 × median)', () => {
    expect(connected(sc)).toBe(true);
    const d = degrees(sc);
    expect(Math.max(...d)).toBeGreaterThanOrEqual(3 * median(d));
  });

  it('has fibre spans: route factor 1.2–1.5 over the great circle, latency 5 µs/km, some long spans', () => {
    // REFERENCES.md, geography of fibre: route factor 1.2–1.5 (common practice); 5 µs/km (ITU-T G.114 Table A.1).
    for (const s of sc.spans) {
      expect(s.latencyMs).toBeUndefined();
      // Lengths are whole tenths of a km (± 0.05 km), and never below 1 km.
      const gcKm = km(sc, s.a, s.b);
      if (s.lengthKm === 1) continue;
      expect(s.lengthKm).toBeGreaterThanOrEqual(1.2 * gcKm - 0.05 - 1e-9);
      expect(s.lengthKm).toBeLessThanOrEqual(1.5 * gcKm + 0.05 + 1e-9);
    }
    const inv = buildInventory(sc);
    for (const s of sc.spans) expect(inv.network.spans[inv.network.spanIndex.get(s.id)!].latencyMs).toBeCloseTo(s.lengthKm * 0.005, 12);
    const lengths = sc.spans.map((s) => s.lengthKm);
    expect(Math.max(...lengths)).toBeGreaterThanOrEqual(3 * median(lengths));
  });

  it('gives slices of 2–5 functions, priorities 1–5, anchors and budgets of 1.3–3 × the current latency', () => {
    expect(sc.slices.every((s) => s.functions.length >= 2 && s.functions.length <= 5)).toBe(true);
    expect(new Set(sc.slices.map((s) => s.priority))).toEqual(new Set([1, 2, 3, 4, 5]));
    expect(sc.slices.some((s) => s.functions.some((f) => f.anchor))).toBe(true);
    const spanMs = new Map(sc.spans.map((s) => [s.id, s.lengthKm * 0.005]));
    sc.slices.forEach((s, i) => s.ties.forEach((t) => {
      const ms = Math.max(0.25, sc.placements[i].paths[t.id].reduce((a, id) => a + spanMs.get(id)!, 0));
      expect(t.maxLatencyMs / ms).toBeGreaterThanOrEqual(1.3 - 1e-6);
      expect(t.maxLatencyMs / ms).toBeLessThanOrEqual(3 + 0.001 / ms + 1e-6);
    }));
  });

  it('has one window of a site and two loaded spans that do not touch it, and the rest stays connected', () => {
    const w = r.window;
    expect(sc.windows).toEqual([w]);
    expect(w.down.sites).toHaveLength(1);
    expect(w.down.spans).toHaveLength(2);
    const used = new Set(sc.placements.flatMap((p) => Object.values(p.paths).flat()));
    for (const id of w.down.spans) {
      const span = sc.spans.find((s) => s.id === id)!;
      expect([span.a, span.b]).not.toContain(w.down.sites[0]);
      expect(used.has(id)).toBe(true);
    }
    expect(sc.placements.some((p) => Object.values(p.sites).includes(w.down.sites[0]))).toBe(true);
  });

  it('makes capacity scarce: peak utilisation ≥ 0.8 with the window down on shortest detours, slack elsewhere', () => {
    const peak = referencePeak(sc);
    expect(peak).toBeGreaterThanOrEqual(0.8);
    expect(r.detourPeakUtilisation).toBeCloseTo(peak, 9);
    const load = new Map<string, number>();
    sc.slices.forEach((s, i) => s.ties.forEach((t) => sc.placements[i].paths[t.id].forEach((id) => load.set(id, (load.get(id) ?? 0) + t.bandwidthGbps))));
    const slack = sc.spans.filter((s) => (load.get(s.id) ?? 0) / s.capacityGbps <= 0.7);
    expect(slack.length).toBeGreaterThanOrEqual(sc.spans.length / 2);
  });

  it('builds a knock-on gate: a full two-span site whose one span left is short, and an untouched slice that could free it', () => {
    const g = r.knockOnGate!;
    expect(g).not.toBeNull();
    const w = r.window;
    const own = sc.spans.filter((s) => s.a === g.site || s.b === g.site);
    expect(own).toHaveLength(2);
    const downSpans = own.filter((s) => w.down.spans.includes(s.id) || w.down.sites.includes(s.a) || w.down.sites.includes(s.b));
    expect(downSpans).toHaveLength(1);
    expect(own.map((s) => s.id).filter((id) => id !== downSpans[0].id)).toEqual([g.span]);
    const x = sc.spans.find((s) => s.id === g.span)!;
    const { now, during } = referenceLoads(sc);
    expect(now.get(x.id)!).toBeLessThanOrEqual(x.capacityGbps);
    expect(during.get(x.id)! - x.capacityGbps).toBeCloseTo(g.shortfallGbps, 3);
    expect(g.shortfallGbps).toBeGreaterThan(0);
    // The gate site is full: less spare vCPU than the smallest function (1 vCPU).
    const site = sc.sites.find((s) => s.id === g.site)!;
    const onSite = sc.slices.flatMap((s, i) => s.functions.filter((f) => sc.placements[i].sites[f.id] === g.site));
    expect(site.cpu - onSite.reduce((a, f) => a + f.cpu, 0)).toBeLessThan(1);
    const fixed = new Set(g.fixedFunctions);
    expect(onSite.filter((f) => fixed.has(f.id)).every((f) => f.fixed)).toBe(true);
    // Some slice the window does not touch has one movable function on the site and more than the shortfall on X.
    const downSite = new Set(w.down.sites);
    const cut = new Set(sc.spans.filter((s) => w.down.spans.includes(s.id) || downSite.has(s.a) || downSite.has(s.b)).map((s) => s.id));
    const untouched = sc.slices.filter((_s, i) => !Object.values(sc.placements[i].paths).flat().some((id) => cut.has(id))
      && !Object.values(sc.placements[i].sites).some((id) => downSite.has(id)));
    const frees = untouched.filter((s) => {
      const p = sc.placements[sc.slices.indexOf(s)];
      const here = s.functions.filter((f) => p.sites[f.id] === g.site);
      const onX = s.ties.filter((t) => p.paths[t.id].includes(x.id)).reduce((a, t) => a + t.bandwidthGbps, 0);
      return here.length === 1 && !here[0].fixed && !here[0].anchor && onX > g.shortfallGbps;
    });
    expect(frees.length).toBeGreaterThan(0);
  });
});

describe('the knock-on gate, solved exactly', () => {
  it('leaves a slice unresolved with touched slices only, and none once untouched slices may move', async () => {
    // HiGHS (REFERENCES.md: the exact reference) on a 10-site instance, small enough to prove both optima.
    const r = buildRealShapeScenario({ sites: 10, slices: 12, seed: 1 });
    expect(r.knockOnGate).not.toBeNull();
    const inv = buildInventory(r.scenario);
    const w = compileWindow(r.window);
    const touchedOnly = await exactPlan(buildRemapProblem(inv, w, { maxCandidates: 8 }), { timeLimitMs: 30_000 });
    const withKnockOn = await exactPlan(buildRemapProblem(inv, w, { maxCandidates: 8, knockOn: { maxMoves: 5 } }), { timeLimitMs: 30_000 });
    expect(touchedOnly.optimal && withKnockOn.optimal).toBe(true);
    expect(touchedOnly.objective.unresolved).toBeGreaterThanOrEqual(1);
    expect(withKnockOn.objective.unresolved).toBeLessThan(touchedOnly.objective.unresolved);
  }, 120_000);
});
