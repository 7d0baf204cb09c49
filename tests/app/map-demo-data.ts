// Map data built from the invented demo scenario the way the API does: load = what the current placements book.
import demo from '@/scenarios/demo.json';
import type { NetworkMapData } from '@/components/map/map-types';
import type { MapOutline, MapSiteKind } from '@/components/map/map-types';

type DemoSlice = { id: string; functions: { id: string; cpu: number }[]; ties: { id: string; bandwidthGbps: number }[] };
type DemoPlacement = { slice: string; sites: Record<string, string>; paths: Record<string, string[]> };

export function demoMapData(): NetworkMapData {
  const cpuUsed = new Map<string, number>();
  const gbpsUsed = new Map<string, number>();
  const slices = demo.slices as DemoSlice[];
  const placements = new Map((demo.placements as unknown as DemoPlacement[]).map((p) => [p.slice, p]));
  for (const slice of slices) {
    const placement = placements.get(slice.id);
    if (!placement) continue;
    for (const fn of slice.functions) {
      const site = placement.sites[fn.id];
      cpuUsed.set(site, (cpuUsed.get(site) ?? 0) + fn.cpu);
    }
    for (const tie of slice.ties) {
      for (const span of placement.paths[tie.id] ?? []) gbpsUsed.set(span, (gbpsUsed.get(span) ?? 0) + tie.bandwidthGbps);
    }
  }
  return {
    name: demo.name,
    outline: demo.outline as MapOutline,
    sites: demo.sites.map((s) => ({
      id: s.id, name: s.name, kind: s.kind as MapSiteKind, lat: s.lat, lon: s.lon, cpuUtilisation: (cpuUsed.get(s.id) ?? 0) / s.cpu,
    })),
    spans: demo.spans.map((s) => ({
      id: s.id, a: s.a, b: s.b, capacityGbps: s.capacityGbps, utilisation: (gbpsUsed.get(s.id) ?? 0) / s.capacityGbps,
    })),
  };
}
