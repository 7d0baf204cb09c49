// A knock-on gate: a place next to a window where touched slices can survive only if an untouched slice moves.
// A site `a` with two spans, one taken down by the window, keeps one span X; every touched slice with a
// function on `a` (made fixed there) must send all its ties from `a` over X, and `a` is full (less than one
// vCPU spare), so no other function can join them there to shorten a tie. X gets just too little capacity for
// them — short by δ — while an untouched slice on X whose one function on `a` could move (no anchor, not
// fixed) carries more than δ. So the touched-only optimum leaves at least one slice unresolved, and moving
// that untouched slice makes room: a case "exact with knock-on blocks" can prove and a search should find.
import type { Inventory, SlicePlacement, WindowSpec } from '../../planner/model/types';
import { windowCapacity } from '../../planner/model/window-capacity';
import type { DetourLoad } from './detour-load';

export interface KnockOnGate {
  /** site index of `a` */
  site: number;
  /** span index of X, a's one span left up */
  span: number;
  /** touched slices' functions on `a`, to be made fixed: [slice, function] */
  fixed: [number, number][];
  /** how much X is short of the touched slices' need (Gbit/s) */
  shortfallGbps: number;
  capacityGbps: number;
}

const floorTenth = (x: number) => Math.floor(x * 10 + 1e-9) / 10;

/** vCPU of the gate's site: its load rounded up to a tenth, below the smallest function (1 vCPU) spare. */
export const gateSiteCpu = (loadCpu: number) => Math.ceil(loadCpu * 10 - 1e-9) / 10;

function load(inv: Inventory, slice: number, p: SlicePlacement, span: number): number {
  return inv.slices[slice].ties.reduce((sum, t, k) => sum + (p.paths[k].includes(span) ? t.bandwidthGbps : 0), 0);
}

function meetsLimits(inv: Inventory, slice: number, p: SlicePlacement): boolean {
  const spans = inv.network.spans;
  return inv.slices[slice].ties.every((t, k) => {
    const path = p.paths[k];
    const latencyMs = path.reduce((a, s) => a + spans[s].latencyMs, 0);
    const availability = path.reduce((a, s) => a * spans[s].availability, 1);
    return latencyMs <= t.maxLatencyMs && (t.minAvailability === undefined || availability >= t.minAvailability);
  });
}

/** Room an untouched slice frees on X by moving its one movable function off `a` (0 when it cannot). */
function movableLoad(inv: Inventory, slice: number, a: number, x: number): number {
  const p = inv.placements[slice];
  const onA = p.sites.flatMap((site, fn) => (site === a ? [fn] : []));
  if (onA.length !== 1) return 0;
  const f = inv.slices[slice].functions[onA[0]];
  return f.fixed || f.anchor ? 0 : load(inv, slice, p, x);
}

function gateAt(inv: Inventory, d: DetourLoad, a: number, x: number): KnockOnGate | null {
  const touched = new Set(d.touched);
  const fixed: [number, number][] = [];
  for (const [slice, detour] of d.detours) {
    const onA = inv.placements[slice].sites.flatMap((site, fn) => (site === a ? [fn] : []));
    const onX = detour ? load(inv, slice, detour, x) : 0;
    if (onA.length === 0) {
      if (onX > 0) return null; // a touched slice that could avoid X would make the shortfall uncertain
      continue;
    }
    if (!detour) continue; // stranded anyway: it asks nothing of X
    if (!meetsLimits(inv, slice, detour)) return null; // its need on X would be moot
    onA.forEach((fn) => fixed.push([slice, fn]));
  }
  const needGbps = d.windowGbps[x] - d.nowGbps[x];
  let roomGbps = 0;
  for (let s = 0; s < inv.slices.length; s += 1) if (!touched.has(s)) roomGbps = Math.max(roomGbps, movableLoad(inv, s, a, x));
  if (fixed.length === 0 || needGbps <= 0 || roomGbps <= 0) return null;
  const shortfallGbps = Math.min(needGbps, roomGbps) / 2;
  const capacityGbps = floorTenth(d.windowGbps[x] - shortfallGbps);
  const ok = capacityGbps >= d.nowGbps[x] && capacityGbps < d.windowGbps[x] - 1e-9 && capacityGbps >= d.windowGbps[x] - roomGbps + 1e-9;
  return ok ? { site: a, span: x, fixed, shortfallGbps: d.windowGbps[x] - capacityGbps, capacityGbps } : null;
}

/** The first gate (by site index) the window offers, or null. */
export function findKnockOnGate(inv: Inventory, window: WindowSpec, d: DetourLoad): KnockOnGate | null {
  const net = inv.network;
  const cap = windowCapacity(inv, window);
  for (let a = 0; a < net.sites.length; a += 1) {
    if (cap.siteDown[a] || net.adjStart[a + 1] - net.adjStart[a] !== 2) continue;
    const [s1, s2] = [net.adjSpan[net.adjStart[a]], net.adjSpan[net.adjStart[a] + 1]];
    if (cap.spanDown[s1] === cap.spanDown[s2]) continue;
    const gate = gateAt(inv, d, a, cap.spanDown[s1] ? s2 : s1);
    if (gate) return gate;
  }
  return null;
}
