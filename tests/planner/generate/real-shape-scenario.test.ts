// Real-shape benchmark scenarios: valid, deterministic, connected, heavy-tailed, fibre-like spans, and scarce
// capacity around their window — the last checked with reference libraries (dijkstrajs, @turf/distance),
// not with the generator's own detour code.
import turfDistance from '@turf/distance';
import dijkstra from 'dijkstrajs';
import { buildRealShapeScenario } from '../../../planner/generate/real-shape-scenario';
import { buildInventory } from '../../../planner/model/build-inventory';
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
function referencePeak(sc: Scenario): number {
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
  const add = (span: string, gbps: number) => load.set(span, (load.get(span) ?? 0) + gbps);
  const isUp = new Set(up.map((s) => s.id));
  sc.slices.forEach((slice, i) => {
    const p = sc.placements[i];
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
  return Math.max(...up.map((s) => (load.get(s.id) ?? 0) / s.capacityGbps));
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
});
