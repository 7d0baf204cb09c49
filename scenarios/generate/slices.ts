// Slices of the demo and where they live now: functions on the nearest site with room, ties on the
// shortest-latency path that still has bandwidth, latency budgets chosen from the route found.
import type { ScenarioFunction, ScenarioPlacement, ScenarioSlice, ScenarioTie } from '../../shared/scenario';
import type { DemoNetwork, Route } from './network';
import type { Rng } from './random';
import { between, intBetween, pick, round } from './random';
import type { FunctionSpec, Profile } from './tenants';
import { TIER_KINDS } from './tenants';

const AVAILABILITY_TIERS = [0.9999, 0.9995, 0.999, 0.995, 0.99];

/** The nearest other site (by latency from `from`) of the wanted kinds with `cpu` to spare. */
function nearestWithRoom(net: DemoNetwork, from: string, kinds: string[], cpu: number): string {
  const tree = net.shortest(from);
  // Another site than the previous function's, so most ties really cross the network.
  const candidates = net.sites
    .filter((s) => s.id !== from && kinds.includes(s.kind) && net.cpuFree(s.id) >= cpu && tree.has(s.id))
    .sort((a, b) => tree.get(a.id)!.latencyMs - tree.get(b.id)!.latencyMs);
  if (candidates.length === 0) throw new Error(`no ${kinds.join('/')} site with ${cpu} vCPU free near ${from}`);
  return candidates[0].id;
}

function siteFor(net: DemoNetwork, spec: FunctionSpec, cpu: number, home: string, previous: string): string {
  if (spec.where === 'home') {
    if (net.cpuFree(home) < cpu) throw new Error(`home site ${home} is full`);
    return home;
  }
  if (spec.where === 'with-previous' && net.cpuFree(previous) >= cpu) return previous;
  const tier = spec.where === 'with-previous' ? 'edge' : spec.where;
  return nearestWithRoom(net, previous, TIER_KINDS[tier], cpu);
}

function makeFunction(rng: Rng, profile: Profile, spec: FunctionSpec, sliceId: string, home: string, net: DemoNetwork): ScenarioFunction {
  const fn: ScenarioFunction = { id: `${sliceId}-${spec.role}`, name: spec.name, cpu: intBetween(rng, spec.cpu[0], spec.cpu[1]) };
  if (spec.moveCost !== undefined) fn.moveCost = spec.moveCost;
  if (spec.where !== 'home') return fn;
  const { anchor } = profile;
  if (rng() < anchor.site) fn.anchor = { site: home };
  else if (rng() < anchor.point) {
    const s = net.site.get(home)!;
    fn.anchor = { lat: s.lat, lon: s.lon, radiusKm: anchor.radiusKm };
  }
  if (rng() < anchor.fixed) fn.fixed = true;
  return fn;
}

/** Route a tie; when the shortest path is full, halve the demand rather than over-book (the demo must fit). */
function routeTie(net: DemoNetwork, from: string, to: string, gbps: number): { route: Route; gbps: number } {
  for (let demand = gbps; demand >= 0.01; demand /= 2) {
    const route = net.route(from, to, demand);
    if (route) return { route, gbps: round(demand, 3) };
  }
  throw new Error(`no route from ${from} to ${to}`);
}

function budgetFor(profile: Profile, latencyMs: number): number {
  const wanted = latencyMs * 1.25; // headroom so a small detour still fits
  return profile.budgetsMs.find((b) => b >= wanted) ?? Math.ceil(latencyMs * 1.5);
}

export interface PlacedDemoSlice {
  slice: ScenarioSlice;
  placement: ScenarioPlacement;
}

interface PlacedFunctions {
  specs: FunctionSpec[];
  functions: ScenarioFunction[];
  sites: Record<string, string>;
}

function placeFunctions(rng: Rng, profile: Profile, sliceId: string, home: string, net: DemoNetwork): PlacedFunctions {
  const specs = rng() < profile.extra.odds ? [...profile.chain, profile.extra.spec] : profile.chain;
  const functions: ScenarioFunction[] = [];
  const sites: Record<string, string> = {};
  specs.forEach((spec, i) => {
    const fn = makeFunction(rng, profile, spec, sliceId, home, net);
    // The control function hangs off the user plane (index 1); the rest form a chain.
    const previous = i === 0 ? home : sites[functions[spec === profile.extra.spec ? 1 : i - 1].id];
    sites[fn.id] = siteFor(net, spec, fn.cpu, home, previous);
    net.bookCpu(sites[fn.id], fn.cpu);
    functions.push(fn);
  });
  return { specs, functions, sites };
}

function routeTies(rng: Rng, profile: Profile, sliceId: string, placed: PlacedFunctions, net: DemoNetwork) {
  const { specs, functions, sites } = placed;
  const accessGbps = round(between(rng, profile.gbps[0], profile.gbps[1]), 2);
  const ties: ScenarioTie[] = [];
  const paths: Record<string, string[]> = {};
  functions.slice(1).forEach((fn, i) => {
    const isControl = specs[i + 1] === profile.extra.spec;
    const from = isControl ? functions[1] : functions[i];
    const wanted = isControl ? 0.02 : i === 0 ? accessGbps : round(accessGbps * between(rng, 0.5, 1), 2);
    const { route, gbps } = routeTie(net, sites[from.id], sites[fn.id], wanted);
    net.bookRoute(route, gbps);
    const tie: ScenarioTie = { id: `${sliceId}-t${i + 1}`, from: from.id, to: fn.id, bandwidthGbps: gbps, maxLatencyMs: budgetFor(profile, route.latencyMs) };
    const minAvailability = AVAILABILITY_TIERS.find((a) => a <= route.availability);
    if ((profile.critical || profile.sst === 2) && minAvailability) tie.minAvailability = minAvailability;
    ties.push(tie);
    paths[tie.id] = route.spans;
  });
  return { ties, paths };
}

export function makeSlice(rng: Rng, profile: Profile, n: number, tenantIndex: number, net: DemoNetwork): PlacedDemoSlice {
  const sliceId = `sl-${profile.short}-${String(n).padStart(2, '0')}`;
  const homes = net.sites.filter((s) => profile.homes.includes(s.name) && net.cpuFree(s.id) >= profile.chain[0].cpu[1]);
  if (homes.length === 0) throw new Error(`no home site of ${profile.tenant.id} has room left`);
  const home = pick(rng, homes);
  const placed = placeFunctions(rng, profile, sliceId, home.id, net);
  const { ties, paths } = routeTies(rng, profile, sliceId, placed, net);
  const slice: ScenarioSlice = {
    id: sliceId, tenant: profile.tenant.id, name: `${pick(rng, profile.purposes)} — ${home.name}`, sst: profile.sst,
    sd: ((tenantIndex + 1) * 0x10000 + n).toString(16).toUpperCase().padStart(6, '0'),
    priority: intBetween(rng, profile.priority[0], profile.priority[1]), functions: placed.functions, ties,
  };
  if (profile.critical) slice.critical = true;
  return { slice, placement: { slice: sliceId, sites: placed.sites, paths } };
}
