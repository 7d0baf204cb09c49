// Benchmark scenarios of real network shape, from a seed: sites around invented towns, links grown by
// preferential attachment (heavy-tailed degrees, a few long spans), fibre routes longer than the great
// circle, slices with latency budgets that leave room for detours, and capacity made scarce around one
// window of a site and two spans — where the window allows, with a knock-on gate (knock-on-gate.ts): touched
// slices that fit only if an untouched slice moves. Pure and deterministic; every name and figure is invented.
import type { Scenario, ScenarioSite, ScenarioSlice, ScenarioSpan, ScenarioTenant, ScenarioWindow } from '../../shared/scenario';
import { greatCircleKm } from '../../planner/geo/great-circle';
import { buildInventory, compileWindow } from '../../planner/model/build-inventory';
import { buildNetwork } from '../../planner/model/build-network';
import { createRng, deriveSeed, type Rng } from '../../planner/random/rng';
import { detourLoad, detourPeakUtilisation } from './detour-load';
import { findKnockOnGate, gateSiteCpu, type KnockOnGate } from './knock-on-gate';
import { preferentialAttachment } from './preferential-attachment';
import { pickRealShapeWindow } from './real-shape-window';
import { loadRealShapeSlices } from './real-shape-slices';
import { scarceSpanCapacities, slackSiteCapacities, type Band, type ScarceCapacityOptions } from './scarce-capacity';
import { CPU_FACTOR, kindsByDegree } from './scenario-builder';
import { townSites } from './town-sites';

export interface RealShapeOptions {
  sites: number;
  slices: number;
  seed: number;
  tenants?: number;
  /** links each new site adds (preferential attachment's m) */
  linksPerSite?: number;
  /** D of the attachment's distance factor exp(−d / D), km */
  distanceScaleKm?: number;
  /** fibre route length over great-circle distance */
  routeFactor?: Band;
  capacity?: Partial<ScarceCapacityOptions>;
  /** prefer a window with a knock-on gate and build it (default true) */
  knockOnGate?: boolean;
}

export interface RealShapeScenario {
  /** the scenario, its window included (scenario.windows = [window]) */
  scenario: Scenario;
  window: ScenarioWindow;
  /** peak span utilisation with the window down and every touched slice on its shortest surviving path */
  detourPeakUtilisation: number;
  /** the knock-on gate built into the scenario, by ids; null when the window offered none */
  knockOnGate: { site: string; span: string; shortfallGbps: number; fixedFunctions: string[] } | null;
}

export const REAL_SHAPE_DEFAULTS = {
  tenants: 5,
  linksPerSite: 2,
  // Invented: most links stay within a town or two (median span ≈ 50–80 km in a ~450 × 500 km region).
  distanceScaleKm: 60,
  // Route factor 1.2–1.5 over the great circle (REFERENCES.md, geography of fibre; common practice).
  routeFactor: { lo: 1.2, hi: 1.5 },
  knockOnGate: true,
};

/** Placeholder capacity before dimensioning; the slices are routed by latency, so it shapes nothing. */
const PLACEHOLDER = 1000;

function makeNetwork(o: RealShapeOptions & typeof REAL_SHAPE_DEFAULTS, rng: Rng): { sites: ScenarioSite[]; spans: ScenarioSpan[] } {
  const { points } = townSites({ sites: o.sites, seed: deriveSeed(o.seed, 1) });
  const g = preferentialAttachment({
    sites: o.sites, seed: deriveSeed(o.seed, 2), linksPerSite: o.linksPerSite, points, distanceScaleKm: o.distanceScaleKm,
  });
  const kinds = kindsByDegree(g.degree);
  const sites = points.map((p, i): ScenarioSite => ({
    id: `site-${String(i + 1).padStart(4, '0')}`, name: `Site ${i + 1}`, kind: kinds[i],
    lat: Math.round(p.lat * 1e5) / 1e5, lon: Math.round(p.lon * 1e5) / 1e5,
    cpu: PLACEHOLDER * CPU_FACTOR[kinds[i]],
    mtbfHours: Math.round(50_000 + rng() * 150_000), mttrHours: Math.round(2 + rng() * 6),
  }));
  const spans = g.links.map(([u, v], k): ScenarioSpan => {
    const factor = o.routeFactor.lo + rng() * (o.routeFactor.hi - o.routeFactor.lo);
    const lengthKm = Math.max(1, Math.round(greatCircleKm(sites[u], sites[v]) * factor * 10) / 10);
    // No latencyMs: the format derives it from the length at 5 µs/km (ITU-T G.114), as the planner does.
    return {
      id: `span-${String(k + 1).padStart(5, '0')}`, a: sites[u].id, b: sites[v].id, capacityGbps: PLACEHOLDER, lengthKm,
      // About 3 fibre cuts per 1,000 route-km per year (common-practice order of magnitude, as scenario-builder).
      mtbfHours: Math.round(8760 / (0.003 * lengthKm)), mttrHours: Math.round(6 + rng() * 6),
    };
  });
  return { sites, spans };
}

function makeTenants(count: number): ScenarioTenant[] {
  return Array.from({ length: count }, (_, i) => ({ id: `tenant-${i + 1}`, name: `Tenant ${i + 1}`, noticeDays: 7 + (i % 3) * 7 }));
}

/** The slices with the gate's functions fixed on their site. */
function withFixed(slices: ScenarioSlice[], gate: KnockOnGate | null): ScenarioSlice[] {
  if (!gate) return slices;
  const fixed = new Set(gate.fixed.map(([slice, fn]) => `${slice}/${fn}`));
  return slices.map((s, i) => (gate.fixed.some(([slice]) => slice === i)
    ? { ...s, functions: s.functions.map((f, k) => (fixed.has(`${i}/${k}`) ? { ...f, fixed: true } : f)) }
    : s));
}

export function buildRealShapeScenario(options: RealShapeOptions): RealShapeScenario {
  const o = { ...REAL_SHAPE_DEFAULTS, ...options };
  const raw = makeNetwork(o, createRng(deriveSeed(o.seed, 3)));
  const tenants = makeTenants(o.tenants);
  const loaded = loadRealShapeSlices(buildNetwork(raw.sites, raw.spans), createRng(deriveSeed(o.seed, 4)), {
    count: o.slices, tenants: tenants.map((t) => t.id),
  });
  const draft: Scenario = {
    format: 'slackwater-scenario/1', name: `Real-shape ${o.sites} sites, ${o.slices} slices, seed ${o.seed}`,
    sites: raw.sites, spans: raw.spans, tenants, slices: loaded.slices, placements: loaded.placements,
  };
  const inv = buildInventory(draft);
  const gateOf = (w: ScenarioWindow) => (o.knockOnGate ? findKnockOnGate(inv, compileWindow(w), detourLoad(inv, compileWindow(w))) : null);
  const window = pickRealShapeWindow(inv, createRng(deriveSeed(o.seed, 5)), (w) => gateOf(w) !== null);
  const spec = compileWindow(window);
  const gate = gateOf(window);
  const rng = createRng(deriveSeed(o.seed, 6));
  // Fixing functions where they sit changes no load, so the detours measured on the draft still hold.
  const gbps = scarceSpanCapacities(detourLoad(inv, spec), rng, o.capacity);
  if (gate) gbps[gate.span] = gate.capacityGbps;
  const load = new Float64Array(raw.sites.length);
  inv.slices.forEach((s, i) => s.functions.forEach((f, k) => (load[inv.placements[i].sites[k]] += f.cpu)));
  const cpu = slackSiteCapacities(load, rng, o.capacity);
  if (gate) cpu[gate.site] = gateSiteCpu(load[gate.site]);
  const scenario: Scenario = {
    ...draft,
    sites: raw.sites.map((s, i) => ({ ...s, cpu: cpu[i] })),
    spans: raw.spans.map((s, i) => ({ ...s, capacityGbps: gbps[i] })),
    slices: withFixed(loaded.slices, gate),
    windows: [window],
  };
  const knockOnGate = gate && {
    site: raw.sites[gate.site].id, span: raw.spans[gate.span].id, shortfallGbps: Math.round(gate.shortfallGbps * 1000) / 1000,
    fixedFunctions: gate.fixed.map(([slice, fn]) => loaded.slices[slice].functions[fn].id),
  };
  return { scenario, window, detourPeakUtilisation: detourPeakUtilisation(buildInventory(scenario), spec), knockOnGate };
}
