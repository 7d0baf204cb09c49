// Scales generated demands and dimensions capacities so the peak utilisation lands in a target band.
// Operators dimension links and sites to their load; here: demands scaled so a typical loaded element
// runs at TYPICAL_UTILISATION, then every element above the band gets capacity for a utilisation drawn
// inside the band, so the peak lies in [lo, hi] and most elements keep head-room for re-placement.
import type { ScenarioSite, ScenarioSpan } from '../../shared/scenario';
import type { Rng } from '../../planner/random/rng';
import type { LoadedSlices } from './slice-loader';

const TYPICAL_UTILISATION = 0.35;
const DIGITS = 1000;

export interface LoadBand {
  lo: number;
  hi: number;
}

function median(xs: number[]): number {
  if (xs.length === 0) return 0;
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

const roundDemand = (x: number) => Math.max(1 / DIGITS, Math.round(x * DIGITS) / DIGITS);
const ceilCapacity = (x: number) => Math.ceil(x * DIGITS) / DIGITS;

function siteLoads(loaded: LoadedSlices, siteCount: number): Float64Array {
  const load = new Float64Array(siteCount);
  loaded.slices.forEach((s, i) => s.functions.forEach((f, k) => (load[loaded.functionSites[i][k]] += f.cpu)));
  return load;
}

function spanLoads(loaded: LoadedSlices, spanCount: number): Float64Array {
  const load = new Float64Array(spanCount);
  loaded.slices.forEach((s, i) => s.ties.forEach((t, k) => {
    for (const span of loaded.pathSpans[i][k]) load[span] += t.bandwidthGbps;
  }));
  return load;
}

/** Factor that brings the median loaded element to TYPICAL_UTILISATION, raised if the peak would stay below the band. */
function demandFactor(load: Float64Array, capacity: number[], band: LoadBand, rng: Rng): number {
  const utils: number[] = [];
  for (let i = 0; i < load.length; i += 1) if (load[i] > 0) utils.push(load[i] / capacity[i]);
  if (utils.length === 0) return 1;
  const peak = Math.max(...utils);
  const factor = TYPICAL_UTILISATION / median(utils);
  const target = band.lo + rng() * (band.hi - band.lo);
  return peak * factor < band.lo ? target / peak : factor;
}

/** Capacities of overloaded elements raised so that each lands at a utilisation drawn inside the band. */
function dimension(load: Float64Array, capacity: number[], band: LoadBand, rng: Rng): number[] {
  return capacity.map((c, i) => {
    if (load[i] <= c * band.hi) return c;
    return ceilCapacity(load[i] / (band.lo + rng() * (band.hi - band.lo)));
  });
}

/** Mutates demands in `loaded` and returns dimensioned copies of the sites and spans. */
export function scaleToBand(
  loaded: LoadedSlices, sites: ScenarioSite[], spans: ScenarioSpan[], band: LoadBand, rng: Rng,
): { sites: ScenarioSite[]; spans: ScenarioSpan[] } {
  const cpuFactor = demandFactor(siteLoads(loaded, sites.length), sites.map((s) => s.cpu), band, rng);
  const gbpsFactor = demandFactor(spanLoads(loaded, spans.length), spans.map((s) => s.capacityGbps), band, rng);
  for (const s of loaded.slices) {
    for (const f of s.functions) f.cpu = roundDemand(f.cpu * cpuFactor);
    for (const t of s.ties) t.bandwidthGbps = roundDemand(t.bandwidthGbps * gbpsFactor);
  }
  const cpu = dimension(siteLoads(loaded, sites.length), sites.map((s) => s.cpu), band, rng);
  const gbps = dimension(spanLoads(loaded, spans.length), spans.map((s) => s.capacityGbps), band, rng);
  return {
    sites: sites.map((s, i) => ({ ...s, cpu: cpu[i] })),
    spans: spans.map((s, i) => ({ ...s, capacityGbps: gbps[i] })),
  };
}

/** Highest utilisation over spans (for reports and tests). */
export function peakSpanUtilisation(loaded: LoadedSlices, spans: ScenarioSpan[]): number {
  const load = spanLoads(loaded, spans.length);
  let peak = 0;
  spans.forEach((s, i) => (peak = Math.max(peak, load[i] / s.capacityGbps)));
  return peak;
}
