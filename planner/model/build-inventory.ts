// Compiles a validated scenario into the planner's Inventory (indices everywhere) and windows into WindowSpecs.
import type { Scenario, ScenarioPlacement, ScenarioSlice, ScenarioWindow, Anchor } from '../../shared/scenario';
import { InvalidScenarioError, UnknownElementError } from '../errors';
import { buildNetwork } from './build-network';
import type { AnchorInfo, Inventory, NetworkModel, SliceInfo, SlicePlacement, WindowSpec } from './types';

const MS_PER_HOUR = 3_600_000;

function toAnchor(anchor: Anchor | undefined, net: NetworkModel, where: string): AnchorInfo | undefined {
  if (anchor === undefined) return undefined;
  if ('site' in anchor) {
    const site = net.siteIndex.get(anchor.site);
    if (site === undefined) throw new UnknownElementError(`${where} is anchored to unknown site "${anchor.site}"`);
    return { site };
  }
  return { lat: anchor.lat, lon: anchor.lon, radiusKm: anchor.radiusKm };
}

function toSliceInfo(s: ScenarioSlice, index: number, net: NetworkModel, tenants: Set<string>): SliceInfo {
  if (!tenants.has(s.tenant)) throw new UnknownElementError(`slice "${s.id}" names unknown tenant "${s.tenant}"`);
  const fnIndex = new Map<string, number>();
  const functions = s.functions.map((f, i) => {
    if (fnIndex.has(f.id)) throw new InvalidScenarioError(`slice "${s.id}" has duplicate function id "${f.id}"`);
    fnIndex.set(f.id, i);
    const anchor = toAnchor(f.anchor, net, `function "${f.id}" of slice "${s.id}"`);
    return {
      id: f.id, cpu: f.cpu, moveCost: f.moveCost ?? 1, fixed: f.fixed ?? false,
      ...(f.name ? { name: f.name } : {}), ...(anchor ? { anchor } : {}),
    };
  });
  const ties = s.ties.map((t) => {
    const from = fnIndex.get(t.from);
    const to = fnIndex.get(t.to);
    if (from === undefined || to === undefined) {
      throw new UnknownElementError(`tie "${t.id}" of slice "${s.id}" names an unknown function`);
    }
    const tie = { id: t.id, from, to, bandwidthGbps: t.bandwidthGbps, maxLatencyMs: t.maxLatencyMs };
    return t.minAvailability === undefined ? tie : { ...tie, minAvailability: t.minAvailability };
  });
  return {
    index, id: s.id, tenant: s.tenant, priority: s.priority, critical: s.critical ?? false, sst: s.sst, functions, ties,
  };
}

function toPlacement(slice: SliceInfo, p: ScenarioPlacement | undefined, net: NetworkModel): SlicePlacement {
  if (p === undefined) throw new InvalidScenarioError(`slice "${slice.id}" has no placement`);
  const sites = slice.functions.map((f) => {
    const siteId = p.sites[f.id];
    if (siteId === undefined) throw new InvalidScenarioError(`placement of "${slice.id}" misses function "${f.id}"`);
    const site = net.siteIndex.get(siteId);
    if (site === undefined) throw new UnknownElementError(`placement of "${slice.id}" names unknown site "${siteId}"`);
    return site;
  });
  const paths = slice.ties.map((t) => {
    const spanIds = p.paths[t.id];
    if (spanIds === undefined) throw new InvalidScenarioError(`placement of "${slice.id}" misses tie "${t.id}"`);
    return spanIds.map((spanId) => {
      const span = net.spanIndex.get(spanId);
      if (span === undefined) throw new UnknownElementError(`placement of "${slice.id}" names unknown span "${spanId}"`);
      return span;
    });
  });
  return { sites, paths };
}

/** Assumes the scenario passed `scenarioSchema`; throws UnknownElementError on dangling references. */
export function buildInventory(scenario: Scenario): Inventory {
  const network = buildNetwork(scenario.sites, scenario.spans);
  const tenants = new Set(scenario.tenants.map((t) => t.id));
  const slices = scenario.slices.map((s, i) => toSliceInfo(s, i, network, tenants));
  const sliceIndex = new Map<string, number>();
  for (const s of slices) {
    if (sliceIndex.has(s.id)) throw new InvalidScenarioError(`duplicate slice id "${s.id}"`);
    sliceIndex.set(s.id, s.index);
  }
  const bySlice = new Map<string, ScenarioPlacement>();
  for (const p of scenario.placements) {
    if (!sliceIndex.has(p.slice)) throw new UnknownElementError(`placement names unknown slice "${p.slice}"`);
    bySlice.set(p.slice, p);
  }
  const placements = slices.map((s) => toPlacement(s, bySlice.get(s.id), network));
  return { network, slices, sliceIndex, placements };
}

/** Scenario window → WindowSpec; ids are kept (checked when the window is used against an inventory). */
/** The planner's WindowSpec of a scenario window (title and work type are not needed, so callers may omit them). */
export function compileWindow(w: Pick<ScenarioWindow, 'id' | 'start' | 'end' | 'down' | 'reduced'>): WindowSpec {
  const durationHours = (Date.parse(w.end) - Date.parse(w.start)) / MS_PER_HOUR;
  const spec: WindowSpec = {
    id: w.id,
    downSites: [...w.down.sites],
    downSpans: [...w.down.spans],
    reduced: (w.reduced ?? []).map((r) => ({ ...r })),
  };
  if (Number.isFinite(durationHours)) spec.durationHours = durationHours;
  return spec;
}
