// The scenario builder produces valid, deterministic scenarios loaded to the 60–70 % peak band.
import { buildScenario } from '../../../scenarios/generate/scenario-builder';
import { buildInventory } from '../../../planner/model/build-inventory';
import { validateScenario } from '../../../shared/scenario-validate';
import type { Scenario } from '../../../shared/scenario';

function peaks(sc: Scenario): { span: number; site: number } {
  const spanLoad = new Map<string, number>();
  const siteLoad = new Map<string, number>();
  sc.slices.forEach((s, i) => {
    for (const f of s.functions) siteLoad.set(sc.placements[i].sites[f.id], (siteLoad.get(sc.placements[i].sites[f.id]) ?? 0) + f.cpu);
    for (const t of s.ties) for (const id of sc.placements[i].paths[t.id]) spanLoad.set(id, (spanLoad.get(id) ?? 0) + t.bandwidthGbps);
  });
  return {
    span: Math.max(...sc.spans.map((s) => (spanLoad.get(s.id) ?? 0) / s.capacityGbps)),
    site: Math.max(...sc.sites.map((s) => (siteLoad.get(s.id) ?? 0) / s.cpu)),
  };
}

describe('buildScenario', () => {
  const sc = buildScenario({ sites: 40, slices: 200, seed: 11 });

  it('passes the schema and every semantic check of validateScenario', () => {
    const v = validateScenario(JSON.parse(JSON.stringify(sc)));
    expect(v.ok ? [] : v.errors).toEqual([]);
    expect(() => buildInventory(sc)).not.toThrow();
  });

  it('loads the peak span and site utilisation into the 60–70 % band', () => {
    const p = peaks(sc);
    expect(p.span).toBeGreaterThanOrEqual(0.6);
    expect(p.span).toBeLessThanOrEqual(0.7 + 1e-9);
    expect(p.site).toBeGreaterThanOrEqual(0.6);
    expect(p.site).toBeLessThanOrEqual(0.7 + 1e-9);
  });

  it('gives slices of 2–5 functions and windows of 1–5 elements', () => {
    expect(sc.slices.every((s) => s.functions.length >= 2 && s.functions.length <= 5)).toBe(true);
    for (const w of sc.windows ?? []) {
      const n = w.down.sites.length + w.down.spans.length + (w.reduced ?? []).length;
      expect(n).toBeGreaterThanOrEqual(1);
      expect(n).toBeLessThanOrEqual(5);
    }
  });

  it('current paths meet each tie latency budget and minimum availability', () => {
    const inv = buildInventory(sc);
    inv.slices.forEach((s, i) => s.ties.forEach((t, k) => {
      const path = inv.placements[i].paths[k];
      const latencyMs = path.reduce((a, span) => a + inv.network.spans[span].latencyMs, 0);
      expect(latencyMs).toBeLessThanOrEqual(t.maxLatencyMs);
      const availability = path.reduce((a, span) => a * inv.network.spans[span].availability, 1);
      if (t.minAvailability !== undefined) expect(availability).toBeGreaterThanOrEqual(t.minAvailability);
    }));
  });

  it('is deterministic per seed', () => {
    expect(buildScenario({ sites: 40, slices: 200, seed: 11 })).toEqual(sc);
    expect(buildScenario({ sites: 40, slices: 200, seed: 12 }).placements).not.toEqual(sc.placements);
  });
});
