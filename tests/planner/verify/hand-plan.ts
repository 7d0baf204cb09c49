// A valid plan built in the test, apart from the planner's search: affected slices re-placed on what the window
// leaves, plus a few knock-on moves of untouched slices. The mutation properties corrupt these plans.
import type { Inventory, SlicePlacement, SlicePlan, WindowSpec } from '../../../planner/model/types';
import { placementLoad, windowCapacity } from '../../../planner/model/window-capacity';
import { shortestLatencyPath } from '../../../planner/paths/shortest-path';
import type { PlanToVerify } from '../../../planner/verify/verify-plan';

/** Chance that a function which could stay moves anyway, and that a path which could stay is found afresh. */
const SHUFFLE = 0.25;
/** Untouched slices offered a knock-on move per plan, at most. */
const KNOCK_ON_TRIES = 2;

interface Room {
  cpu: Float64Array;
  gbps: Float64Array;
}

function claim(inv: Inventory, s: number, p: SlicePlacement, room: Room, sign: 1 | -1): void {
  inv.slices[s].functions.forEach((f, i) => { room.cpu[p.sites[i]] -= sign * f.cpu; });
  inv.slices[s].ties.forEach((t, i) => p.paths[i].forEach((x) => { room.gbps[x] -= sign * t.bandwidthGbps; }));
}

const sameSites = (a: SlicePlacement, b: SlicePlacement) => a.sites.every((x, i) => x === b.sites[i]);
const samePaths = (a: SlicePlacement, b: SlicePlacement) =>
  a.paths.every((p, i) => p.length === b.paths[i].length && p.every((x, k) => x === b.paths[i][k]));

/** A new placement for slice s within `room` (claimed on success), or null. */
function place(inv: Inventory, s: number, room: Room, down: { site: Uint8Array; span: Uint8Array }, rnd: () => number): SlicePlacement | null {
  const slice = inv.slices[s];
  const current = inv.placements[s];
  const sites: number[] = [];
  const undoSites = () => sites.forEach((x, i) => { room.cpu[x] += slice.functions[i].cpu; });
  for (const [i, f] of slice.functions.entries()) {
    const here = current.sites[i];
    const mayStay = !down.site[here] && room.cpu[here] >= f.cpu;
    const options = f.fixed || (mayStay && rnd() >= SHUFFLE)
      ? (mayStay ? [here] : [])
      : inv.network.sites.filter((x) => !down.site[x.index] && room.cpu[x.index] >= f.cpu).map((x) => x.index);
    if (options.length === 0) {
      undoSites();
      return null;
    }
    sites.push(options[Math.floor(rnd() * options.length)]);
    room.cpu[sites[i]] -= f.cpu;
  }
  const paths: number[][] = [];
  for (const [i, t] of slice.ties.entries()) {
    const keep = sites[t.from] === current.sites[t.from] && sites[t.to] === current.sites[t.to]
      && current.paths[i].every((x) => !down.span[x] && room.gbps[x] >= t.bandwidthGbps) && rnd() >= SHUFFLE;
    const found = keep ? { spans: current.paths[i] } : shortestLatencyPath(inv.network, sites[t.from], sites[t.to], {
      spanDown: down.span, siteDown: down.site, residualGbps: room.gbps, minGbps: t.bandwidthGbps, maxLatencyMs: t.maxLatencyMs,
    });
    if (found === null) {
      claim(inv, s, { sites, paths: paths.concat(slice.ties.slice(i).map(() => [])) }, room, -1);
      return null;
    }
    paths.push([...found.spans]);
    found.spans.forEach((x) => { room.gbps[x] -= t.bandwidthGbps; });
  }
  return { sites, paths };
}

function toEntry(inv: Inventory, s: number, p: SlicePlacement | null): SlicePlan {
  const slice = inv.slices[s];
  if (p === null) return { slice: slice.id, outcome: 'unresolved', sites: {}, paths: {} };
  const current = inv.placements[s];
  const outcome = !sameSites(p, current) ? 'move' : !samePaths(p, current) ? 'reroute' : 'stays';
  return {
    slice: slice.id, outcome,
    sites: Object.fromEntries(slice.functions.map((f, i) => [f.id, inv.network.sites[p.sites[i]].id])),
    paths: Object.fromEntries(slice.ties.map((t, i) => [t.id, p.paths[i].map((x) => inv.network.spans[x].id)])),
  };
}

/** Every slice using a down or reduced element gets an entry; a few untouched ones move to make room. */
export function handPlan(inv: Inventory, window: WindowSpec, rnd: () => number): PlanToVerify {
  const cap = windowCapacity(inv, window);
  const down = { site: cap.siteDown, span: cap.spanDown };
  const reducedSites = new Set(window.reduced.flatMap((r) => ('site' in r ? [inv.network.siteIndex.get(r.site)!] : [])));
  const reducedSpans = new Set(window.reduced.flatMap((r) => ('span' in r ? [inv.network.spanIndex.get(r.span)!] : [])));
  const touched = (p: SlicePlacement) => p.sites.some((x) => down.site[x] || reducedSites.has(x))
    || p.paths.some((path) => path.some((x) => down.span[x] || reducedSpans.has(x)));
  const affected = inv.slices.filter((s) => touched(inv.placements[s.index])).map((s) => s.index);
  const untouched = inv.slices.filter((s) => !affected.includes(s.index)).map((s) => s.index);
  const load = placementLoad(inv, untouched);
  const room: Room = { cpu: cap.siteCpu.map((c, i) => c - load.siteCpu[i]), gbps: cap.spanGbps.map((c, i) => c - load.spanGbps[i]) };
  const entries: SlicePlan[] = [];
  for (let k = 0; k < KNOCK_ON_TRIES && affected.length > 0 && untouched.length > 0; k++) {
    const s = untouched[Math.floor(rnd() * untouched.length)];
    if (entries.some((e) => e.slice === inv.slices[s].id)) continue;
    claim(inv, s, inv.placements[s], room, -1);
    const p = place(inv, s, room, down, rnd);
    const entry = toEntry(inv, s, p);
    if (entry.outcome === 'move' || entry.outcome === 'reroute') {
      entries.push({ ...entry, madeRoomFor: [inv.slices[affected[Math.floor(rnd() * affected.length)]].id] });
      continue;
    }
    if (p !== null) claim(inv, s, p, room, -1);
    claim(inv, s, inv.placements[s], room, 1);
  }
  for (const s of affected) entries.push(toEntry(inv, s, place(inv, s, room, down, rnd)));
  return { affected: affected.map((s) => inv.slices[s].id), slices: entries };
}
