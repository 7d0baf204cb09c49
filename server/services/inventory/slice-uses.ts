// Reverse index of the current placements: which slices use each site (hosted, transit) and each span.
import type {
  Scenario, ScenarioFunction, ScenarioPlacement, ScenarioSlice, ScenarioSpan, ScenarioTie,
} from '../../../shared/scenario';
import type { SliceUse } from '../../../shared/inventory';

type UseKind = 'hosted' | 'transit' | 'spans';

/** How many elements' lists of uses a view keeps once made (least recently asked for goes first). */
const RECENT_LISTS = 64;

/**
 * Which slices use each site (hosted, transit) and span, as positions in the view's slice list: one small number
 * per (element, slice) rather than an object, so that 20,000 slices cost little to index and to keep. The
 * element's list of uses, with its functions and ties, is made when someone asks for that element (and shared:
 * callers must not change it).
 */
export interface UseIndex {
  /** how many slices use the element that way */
  count(kind: UseKind, element: string): number;
  /** the slices that use the element that way, in the view's slice order */
  list(kind: UseKind, element: string): SliceUse[];
}

/** Sites a path visits, starting at `fromSite`; a span that does not continue the walk still contributes its far end. */
export function pathSites(fromSite: string, spanIds: readonly string[], spans: Map<string, ScenarioSpan>): string[] {
  const sites = [fromSite];
  let at = fromSite;
  for (const id of spanIds) {
    const span = spans.get(id);
    if (!span) continue;
    at = span.a === at ? span.b : span.b === at ? span.a : span.b;
    sites.push(at);
  }
  return sites;
}

type Visit = (kind: UseKind, element: string, fn: ScenarioFunction | null, tie: ScenarioTie | null) => void;

/** Every use one slice makes of the network, in order: its functions' sites, then per tie its spans and transit sites. */
function walkSlice(slice: ScenarioSlice, p: ScenarioPlacement, spans: Map<string, ScenarioSpan>, visit: Visit): void {
  for (const f of slice.functions) {
    const site = p.sites[f.id];
    if (site) visit('hosted', site, f, null);
  }
  for (const t of slice.ties) {
    const path = p.paths[t.id] ?? [];
    for (const spanId of path) visit('spans', spanId, null, t);
    const from = p.sites[t.from];
    // Interior sites of the path only: the ends host the tie's own functions.
    if (from) for (const site of pathSites(from, path, spans).slice(1, -1)) visit('transit', site, null, t);
  }
}

/** Builds the index for the given slices (the ones the asker may see), walking each slice once. */
export function buildUseIndex(scenario: Scenario, slices: readonly ScenarioSlice[]): UseIndex {
  const spans = new Map(scenario.spans.map((s) => [s.id, s]));
  const tenantNames = new Map(scenario.tenants.map((t) => [t.id, t.name]));
  const placements = new Map(scenario.placements.map((p) => [p.slice, p]));
  const users: Record<UseKind, Map<string, number[]>> = { hosted: new Map(), transit: new Map(), spans: new Map() };
  slices.forEach((slice, position) => {
    const p = placements.get(slice.id);
    if (!p) return;
    walkSlice(slice, p, spans, (kind, element) => {
      const list = users[kind].get(element);
      if (!list) users[kind].set(element, [position]);
      else if (list[list.length - 1] !== position) list.push(position);
    });
  });
  const made = (kind: UseKind, element: string): SliceUse[] => (users[kind].get(element) ?? []).map((position) => {
    const slice = slices[position];
    const use: SliceUse = {
      sliceId: slice.id, sliceName: slice.name, tenantId: slice.tenant,
      tenantName: tenantNames.get(slice.tenant) ?? slice.tenant, critical: slice.critical ?? false, functions: [], ties: [],
    };
    walkSlice(slice, placements.get(slice.id)!, spans, (k, e, fn, tie) => {
      if (k !== kind || e !== element) return;
      if (fn) use.functions.push({ id: fn.id, name: fn.name ?? null, cpu: fn.cpu });
      if (tie) use.ties.push({ id: tie.id, bandwidthGbps: tie.bandwidthGbps });
    });
    return use;
  });
  // The busiest elements are asked for again and again (thousands of uses each): the last few lists are kept.
  const recent = new Map<string, SliceUse[]>();
  const list = (kind: UseKind, element: string): SliceUse[] => {
    const key = `${kind}:${element}`;
    const kept = recent.get(key) ?? made(kind, element);
    recent.delete(key);
    recent.set(key, kept);
    if (recent.size > RECENT_LISTS) recent.delete(recent.keys().next().value!);
    return kept;
  };
  return { count: (kind, element) => users[kind].get(element)?.length ?? 0, list };
}
