// Warnings from what the placements use: site vCPU and span bandwidth over capacity, anchors missed, latency over budget.
import type { Anchor, Scenario } from './scenario';
import { spanLatencyMs } from './scenario';
import type { IssueCollector, PathSegment, ScenarioIndex } from './scenario-validate-context';
import { placedSlices } from './scenario-validate-placements';

/** Mean Earth radius R1 (GRS80 / IUGG), km. */
const EARTH_RADIUS_KM = 6371.0088;

/** Haversine great-circle distance in km. */
export function greatCircleKm(lat1: number, lon1: number, lat2: number, lon2: number): number {
  const rad = Math.PI / 180;
  const dLat = (lat2 - lat1) * rad;
  const dLon = (lon2 - lon1) * rad;
  const h = Math.sin(dLat / 2) ** 2 + Math.cos(lat1 * rad) * Math.cos(lat2 * rad) * Math.sin(dLon / 2) ** 2;
  return 2 * EARTH_RADIUS_KM * Math.asin(Math.min(1, Math.sqrt(h)));
}

const round = (n: number): number => Math.round(n * 1000) / 1000;

/** Sums per site (vCPU) and per span (Gbit/s, both directions share one capacity; each crossing counts). */
function usage(s: Scenario, ix: ScenarioIndex): { cpu: Map<string, number>; gbps: Map<string, number> } {
  const cpu = new Map<string, number>();
  const gbps = new Map<string, number>();
  for (const { placement, slice } of placedSlices(s, ix)) {
    for (const fn of slice.functions) {
      const site = placement.sites[fn.id];
      if (ix.sites.has(site)) cpu.set(site, (cpu.get(site) ?? 0) + fn.cpu);
    }
    for (const tie of slice.ties) {
      for (const spanId of placement.paths[tie.id] ?? []) {
        if (ix.spans.has(spanId)) gbps.set(spanId, (gbps.get(spanId) ?? 0) + tie.bandwidthGbps);
      }
    }
  }
  return { cpu, gbps };
}

export function warnCapacity(s: Scenario, ix: ScenarioIndex, out: IssueCollector): void {
  const { cpu, gbps } = usage(s, ix);
  s.sites.forEach((site, i) => {
    const used = cpu.get(site.id) ?? 0;
    if (ix.sites.get(site.id)?.path[1] === i && used > site.cpu) {
      out.warn(['sites', i, 'cpu'], `placements use ${round(used)} vCPU on site "${site.id}", over its capacity of ${site.cpu} vCPU`);
    }
  });
  s.spans.forEach((span, i) => {
    const used = gbps.get(span.id) ?? 0;
    if (ix.spans.get(span.id)?.path[1] === i && used > span.capacityGbps) {
      out.warn(['spans', i, 'capacityGbps'], `placements use ${round(used)} Gbit/s on span "${span.id}", over its capacity of ${span.capacityGbps} Gbit/s`);
    }
  });
}

function anchorProblem(anchor: Anchor, siteId: string, ix: ScenarioIndex): string | null {
  if ('site' in anchor) return anchor.site === siteId ? null : `is anchored to site "${anchor.site}" but placed on "${siteId}"`;
  const site = ix.sites.get(siteId)!.value;
  const distanceKm = greatCircleKm(anchor.lat, anchor.lon, site.lat, site.lon);
  if (distanceKm <= anchor.radiusKm) return null;
  return `is placed on "${siteId}", ${round(distanceKm)} km from its anchor point (allowed ${anchor.radiusKm} km)`;
}

export function warnAnchorsAndLatency(s: Scenario, ix: ScenarioIndex, out: IssueCollector): void {
  for (const { placement, slice, index } of placedSlices(s, ix)) {
    const at: PathSegment[] = ['placements', index];
    for (const fn of slice.functions) {
      const siteId = placement.sites[fn.id];
      if (!fn.anchor || !ix.sites.has(siteId)) continue;
      const problem = anchorProblem(fn.anchor, siteId, ix);
      if (problem) out.warn([...at, 'sites', fn.id], `function "${fn.id}" ${problem}`);
    }
    for (const tie of slice.ties) {
      const spanIds = placement.paths[tie.id];
      if (!spanIds || !spanIds.every((id) => ix.spans.has(id))) continue;
      const latencyMs = spanIds.reduce((sum, id) => sum + spanLatencyMs(ix.spans.get(id)!.value), 0);
      if (latencyMs > tie.maxLatencyMs) {
        out.warn([...at, 'paths', tie.id], `path latency ${round(latencyMs)} ms is over tie "${tie.id}"'s budget of ${tie.maxLatencyMs} ms`);
      }
    }
  }
}
