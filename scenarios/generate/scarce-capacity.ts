// Dimensions capacities so that a given window is tight: every span the window's obvious detours load (see
// detour-load.ts) gets just enough capacity for a utilisation drawn around 1 during the window — some of
// those detours fit, some overflow — while today's load stays below a ceiling; every other element keeps
// slack. So a good plan exists but needs longer detours, moves, or room made by moving an untouched slice.
// All bands are invented for the benchmark (no source); operators keep links well below full (common practice).
import type { Rng } from '../../planner/random/rng';
import type { DetourLoad } from './detour-load';

export interface Band {
  lo: number;
  hi: number;
}

export interface ScarceCapacityOptions {
  /** utilisation during the window of the spans the obvious detours load */
  detourUtilisation: Band;
  /** the highest utilisation a span may carry today (the current placements must fit) */
  maxUtilisationNow: number;
  /** utilisation today of every other loaded span and of every loaded site */
  slackUtilisation: Band;
}

export const SCARCE_CAPACITY_DEFAULTS: ScarceCapacityOptions = {
  detourUtilisation: { lo: 0.85, hi: 1.15 },
  maxUtilisationNow: 0.9,
  slackUtilisation: { lo: 0.35, hi: 0.7 },
};

/** Capacities are whole tenths (Gbit/s, vCPU), rounded up so no load lands above its drawn utilisation. */
const ceilTenth = (x: number) => Math.ceil(x * 10 - 1e-9) / 10;
const draw = (band: Band, rng: Rng) => band.lo + rng() * (band.hi - band.lo);

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s.length === 0 ? 0 : s[Math.floor(s.length / 2)];
}

/** Span capacities (Gbit/s), parallel to the network's spans. */
export function scarceSpanCapacities(d: DetourLoad, rng: Rng, options: Partial<ScarceCapacityOptions> = {}): number[] {
  const o = { ...SCARCE_CAPACITY_DEFAULTS, ...options };
  const out = Array.from(d.nowGbps, (now, i) => {
    const during = d.windowGbps[i];
    const gains = d.capacityGbps[i] > 0 && during > now + 1e-9;
    if (gains) return ceilTenth(Math.max(now / o.maxUtilisationNow, during / draw(o.detourUtilisation, rng)));
    return now > 0 ? ceilTenth(now / draw(o.slackUtilisation, rng)) : 0;
  });
  // Spans nobody uses today get the capacity of a typical loaded span: spare routes, not free ones.
  const typical = Math.max(1, median(out.filter((c) => c > 0)));
  return out.map((c) => (c > 0 ? c : typical));
}

/** Site vCPU, parallel to the sites: loaded sites at a slack utilisation, empty ones like a typical site. */
export function slackSiteCapacities(loadCpu: Float64Array, rng: Rng, options: Partial<ScarceCapacityOptions> = {}): number[] {
  const o = { ...SCARCE_CAPACITY_DEFAULTS, ...options };
  const out = Array.from(loadCpu, (load) => (load > 0 ? ceilTenth(load / draw(o.slackUtilisation, rng)) : 0));
  const typical = Math.max(1, median(out.filter((c) => c > 0)));
  return out.map((c) => (c > 0 ? c : typical));
}
