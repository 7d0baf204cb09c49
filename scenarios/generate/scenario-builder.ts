// Builds a complete, valid `slackwater-scenario/1` from a seed: Waxman network, tenants, loaded slices, windows.
// All names are invented. Deterministic: the same options give the same scenario.
import type { Scenario, ScenarioSite, ScenarioSpan, ScenarioTenant } from '../../shared/scenario';
import { buildNetwork } from '../../planner/model/build-network';
import type { SiteKind } from '../../planner/model/types';
import { createRng, deriveSeed, type Rng } from '../../planner/random/rng';
import { scaleToBand, type LoadBand } from './load-scaling';
import { randomWindow } from './random-window';
import { loadSlices } from './slice-loader';
import { waxmanGraph, type WaxmanOptions } from './waxman';

export interface ScenarioBuilderOptions {
  sites: number;
  slices: number;
  seed: number;
  tenants?: number;
  windows?: number;
  /** band the peak span and site utilisation should land in */
  band?: LoadBand;
  waxman?: Partial<Omit<WaxmanOptions, 'sites' | 'seed'>>;
  anchorShare?: number;
  fixedShare?: number;
  availabilityShare?: number;
}

export const SCENARIO_BUILDER_DEFAULTS = {
  tenants: 5,
  windows: 5,
  band: { lo: 0.6, hi: 0.7 },
  anchorShare: 0.2,
  fixedShare: 0.05,
  availabilityShare: 0.3,
};

/** Kind by degree rank: the best-connected sites act as core, then aggregation, edge, cell sites. */
export function kindsByDegree(degree: number[]): SiteKind[] {
  const order = degree.map((d, i) => [d, i]).sort((a, b) => b[0] - a[0] || a[1] - b[1]).map(([, i]) => i);
  const kinds: SiteKind[] = new Array(degree.length);
  order.forEach((site, rank) => {
    const share = rank / degree.length;
    kinds[site] = share < 0.05 ? 'core' : share < 0.2 ? 'aggregation' : share < 0.5 ? 'edge' : 'cell-site';
  });
  return kinds;
}

export const CPU_FACTOR: Record<SiteKind, number> = { core: 4, aggregation: 2, edge: 1.5, 'cell-site': 1 };

function makeNetwork(o: ScenarioBuilderOptions, rng: Rng): { sites: ScenarioSite[]; spans: ScenarioSpan[] } {
  const g = waxmanGraph({ ...o.waxman, sites: o.sites, seed: deriveSeed(o.seed, 1) });
  const degree = new Array(o.sites).fill(0);
  for (const [u, v] of g.links) {
    degree[u] += 1;
    degree[v] += 1;
  }
  const kinds = kindsByDegree(degree);
  const sites = g.points.map((p, i): ScenarioSite => ({
    id: `site-${String(i + 1).padStart(4, '0')}`, name: `Site ${i + 1}`, kind: kinds[i],
    lat: Math.round(p.lat * 1e5) / 1e5, lon: Math.round(p.lon * 1e5) / 1e5,
    // Yu et al. 2008 substrate CPU U[50, 100] (memory), times a factor by kind.
    cpu: Math.round((50 + rng() * 50) * CPU_FACTOR[kinds[i]]),
    mtbfHours: Math.round(50_000 + rng() * 150_000), mttrHours: Math.round(2 + rng() * 6),
  }));
  const spans = g.links.map(([u, v], k): ScenarioSpan => {
    const lengthKm = Math.max(1, Math.round(g.lengthsKm[k] * 10) / 10);
    return {
      id: `span-${String(k + 1).padStart(5, '0')}`, a: sites[u].id, b: sites[v].id,
      capacityGbps: Math.round(50 + rng() * 50), lengthKm,
      // About 3 fibre cuts per 1,000 route-km per year (common-practice order of magnitude).
      mtbfHours: Math.round(8760 / (0.003 * lengthKm)), mttrHours: Math.round(6 + rng() * 6),
    };
  });
  return { sites, spans };
}

function makeTenants(count: number): ScenarioTenant[] {
  return Array.from({ length: count }, (_, i) => ({ id: `tenant-${i + 1}`, name: `Tenant ${i + 1}`, noticeDays: 7 + (i % 3) * 7 }));
}

export function buildScenario(options: ScenarioBuilderOptions): Scenario {
  const o = { ...SCENARIO_BUILDER_DEFAULTS, ...options };
  const rng = createRng(deriveSeed(o.seed, 2));
  const raw = makeNetwork(o, rng);
  const tenants = makeTenants(o.tenants);
  const net = buildNetwork(raw.sites, raw.spans);
  const loaded = loadSlices(net, createRng(deriveSeed(o.seed, 3)), {
    count: o.slices, tenants: tenants.map((t) => t.id),
    anchorShare: o.anchorShare, fixedShare: o.fixedShare, availabilityShare: o.availabilityShare,
  });
  const { sites, spans } = scaleToBand(loaded, raw.sites, raw.spans, o.band, rng);
  const scenario: Scenario = {
    format: 'slackwater-scenario/1', name: `Waxman ${o.sites} sites, ${o.slices} slices, seed ${o.seed}`,
    sites, spans, tenants, slices: loaded.slices, placements: loaded.placements,
  };
  const windowRng = createRng(deriveSeed(o.seed, 4));
  scenario.windows = Array.from({ length: o.windows }, (_, i) => randomWindow(scenario, windowRng, `window-${i + 1}`, { day: i }));
  return scenario;
}
