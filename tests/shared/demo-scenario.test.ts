// The committed demo scenario (scenarios/demo.json): valid, the size DESIGN §6 asks for, fits its capacity,
// and reproducible from its generator.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Scenario, ScenarioWindow } from '../../shared/scenario';
import { validateScenario } from '../../shared/scenario-validate';
import { generateDemo, toDemoJson } from '../../scenarios/generate-demo';

const file = join(__dirname, '../../scenarios/demo.json');
const text = readFileSync(file, 'utf8');
const demo = JSON.parse(text) as Scenario;

const elementsOf = (w: ScenarioWindow): string[] => [
  ...w.down.sites, ...w.down.spans, ...(w.reduced ?? []).map((r) => ('site' in r ? r.site : r.span)),
];

/** Ray casting on [lon, lat] pairs: fine for a small polygon away from the poles and the antimeridian. */
function insideRing(lon: number, lat: number, ring: number[][]): boolean {
  let inside = false;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
    const [xi, yi] = ring[i];
    const [xj, yj] = ring[j];
    if (yi > lat !== yj > lat && lon < ((xj - xi) * (lat - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

describe('demo scenario', () => {
  it('validates with no errors and no warnings', () => {
    const result = validateScenario(demo);
    expect(result.ok ? [] : result.errors).toEqual([]);
    expect(result.warnings).toEqual([]);
  });

  it('has the size DESIGN §6 asks for', () => {
    expect(demo.sites.length).toBeGreaterThanOrEqual(30);
    expect(demo.sites.length).toBeLessThanOrEqual(60);
    expect(demo.slices.length).toBeGreaterThanOrEqual(100);
    expect(demo.tenants).toHaveLength(6);
    expect(new Set(demo.slices.map((s) => s.sst)).size).toBeGreaterThanOrEqual(4);
    const tenantsWithCritical = new Set(demo.slices.filter((s) => s.critical).map((s) => s.tenant));
    expect(tenantsWithCritical.size).toBe(1);
    expect(demo.slices.every((s) => s.functions.length >= 2 && s.functions.length <= 4)).toBe(true);
  });

  it('keeps every site on the land of its outline', () => {
    expect(demo.outline?.type).toBe('Polygon');
    const ring = demo.outline!.coordinates[0] as number[][];
    const offshore = demo.sites.filter((s) => !insideRing(s.lon, s.lat, ring));
    expect(offshore.map((s) => s.name)).toEqual([]);
  });

  it('puts no span or site over capacity, with a realistic peak', () => {
    const gbps = new Map<string, number>();
    const cpu = new Map<string, number>();
    demo.slices.forEach((slice, i) => {
      const placement = demo.placements.find((p) => p.slice === slice.id)!;
      expect(placement).toBe(demo.placements[i]);
      for (const tie of slice.ties) for (const id of placement.paths[tie.id]) gbps.set(id, (gbps.get(id) ?? 0) + tie.bandwidthGbps);
      for (const fn of slice.functions) cpu.set(placement.sites[fn.id], (cpu.get(placement.sites[fn.id]) ?? 0) + fn.cpu);
    });
    const spanUse = demo.spans.map((s) => (gbps.get(s.id) ?? 0) / s.capacityGbps);
    const siteUse = demo.sites.map((s) => (cpu.get(s.id) ?? 0) / s.cpu);
    expect(Math.max(...spanUse)).toBeLessThanOrEqual(1);
    expect(Math.max(...siteUse)).toBeLessThanOrEqual(1);
    expect(Math.max(...spanUse)).toBeGreaterThanOrEqual(0.4);
  });

  it('has a month of windows from 3 December 2026 with an overlapping pair on a shared element', () => {
    const windows = demo.windows ?? [];
    expect(windows.length).toBeGreaterThanOrEqual(10);
    const first = Math.min(...windows.map((w) => Date.parse(w.start)));
    const last = Math.max(...windows.map((w) => Date.parse(w.end)));
    expect(new Date(first).toISOString().slice(0, 10)).toBe('2026-12-03');
    expect(last - first).toBeLessThanOrEqual(32 * 24 * 3600 * 1000);
    expect(windows.some((w) => w.start.slice(0, 10) !== w.end.slice(0, 10))).toBe(true); // crosses local midnight
    const conflicts = windows.flatMap((a, i) => windows.slice(i + 1)
      .filter((b) => Date.parse(a.start) < Date.parse(b.end) && Date.parse(b.start) < Date.parse(a.end))
      .filter((b) => elementsOf(a).some((e) => elementsOf(b).includes(e)))
      .map((b) => [a.id, b.id]));
    expect(conflicts.length).toBeGreaterThanOrEqual(1);
  });

  it('uses invented contacts only (reserved .example domains)', () => {
    const emails = demo.tenants.flatMap((t) => t.contacts ?? []).map((c) => c.email);
    expect(emails.length).toBeGreaterThanOrEqual(6);
    expect(emails.every((e) => /@[a-z0-9-]+\.example$/.test(e))).toBe(true);
  });

  it('derives span lengths from great-circle distance × 1.3', () => {
    // Haversine with the mean Earth radius 6371.0088 km (GRS80/IUGG R1, REFERENCES.md: confirmed).
    const rad = Math.PI / 180;
    const byId = new Map(demo.sites.map((s) => [s.id, s]));
    for (const span of demo.spans) {
      const [a, b] = [byId.get(span.a)!, byId.get(span.b)!];
      const h = Math.sin(((b.lat - a.lat) * rad) / 2) ** 2 +
        Math.cos(a.lat * rad) * Math.cos(b.lat * rad) * Math.sin(((b.lon - a.lon) * rad) / 2) ** 2;
      const km = 2 * 6371.0088 * Math.asin(Math.sqrt(h));
      expect(Math.abs(span.lengthKm - km * 1.3)).toBeLessThanOrEqual(0.051);
    }
  });

  it('is exactly what the seeded generator writes (deterministic and up to date)', () => {
    expect(toDemoJson(generateDemo())).toBe(text);
    expect(text.length).toBeLessThan(1_000_000);
  });
});
