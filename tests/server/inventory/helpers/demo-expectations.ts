// Expected figures computed straight from the demo file, independently of the server's code paths.
import type { Scenario } from '../../../../shared/scenario';

export function expectedSpanGbps(s: Scenario, sliceIds?: Set<string>): Map<string, number> {
  const used = new Map<string, number>();
  for (const slice of s.slices) {
    if (sliceIds && !sliceIds.has(slice.id)) continue;
    const p = s.placements.find((x) => x.slice === slice.id)!;
    for (const tie of slice.ties) for (const span of p.paths[tie.id]) used.set(span, (used.get(span) ?? 0) + tie.bandwidthGbps);
  }
  return used;
}

export function expectedSiteCpu(s: Scenario, sliceIds?: Set<string>): Map<string, number> {
  const used = new Map<string, number>();
  for (const slice of s.slices) {
    if (sliceIds && !sliceIds.has(slice.id)) continue;
    const p = s.placements.find((x) => x.slice === slice.id)!;
    for (const f of slice.functions) used.set(p.sites[f.id], (used.get(p.sites[f.id]) ?? 0) + f.cpu);
  }
  return used;
}

/** Sites hosting the slices' functions or at either end of a span their ties cross, and those spans. */
export function footprintOf(s: Scenario, sliceIds: Set<string>): { sites: Set<string>; spans: Set<string> } {
  const sites = new Set<string>();
  const spans = new Set<string>();
  for (const p of s.placements.filter((x) => sliceIds.has(x.slice))) {
    Object.values(p.sites).forEach((x) => sites.add(x));
    Object.values(p.paths).flat().forEach((x) => spans.add(x));
  }
  for (const span of s.spans.filter((x) => spans.has(x.id))) { sites.add(span.a); sites.add(span.b); }
  return { sites, spans };
}

/** Fills the defaults the database stores and sorts every list by id, so two scenarios compare by content. */
export function normalised(s: Scenario): Scenario {
  const byId = <T extends { id: string }>(xs: T[]) => [...xs].sort((a, b) => a.id.localeCompare(b.id));
  return {
    format: s.format,
    ...(s.name ? { name: s.name } : {}),
    ...(s.outline ? { outline: s.outline } : {}),
    sites: byId(s.sites),
    spans: byId(s.spans).map((x) => (x.srlg?.length ? x : (({ srlg: _srlg, ...rest }) => rest)(x))),
    tenants: byId(s.tenants).map((t) => (t.contacts?.length ? t : (({ contacts: _c, ...rest }) => rest)(t))),
    slices: byId(s.slices).map((x) => ({
      ...x,
      critical: x.critical ?? false,
      functions: byId(x.functions).map((f) => ({ ...f, moveCost: f.moveCost ?? 1, fixed: f.fixed ?? false })),
      ties: byId(x.ties),
    })),
    placements: [...s.placements].sort((a, b) => a.slice.localeCompare(b.slice)),
  };
}
