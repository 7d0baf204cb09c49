// Readable names for what a plan moves, worked out on the server so the page and the CSV say the same thing:
// sites by name, paths as the sites they pass in order, functions by name, links by their end functions.
export type PackNameTables = {
  sites: ReadonlyMap<string, string>;
  spanEnds: ReadonlyMap<string, { a: string; b: string }>;
  functions: ReadonlyMap<string, string>;
  tieEnds: ReadonlyMap<string, { from: string; to: string }>;
  tenants: ReadonlyMap<string, string>;
  slices: ReadonlyMap<string, string>;
};

export type PackNames = {
  site: (id: string) => string;
  /** "Ambrymarsh → Orrindale → Castrenholm"; spans as "A – B" joined by commas when they do not chain */
  path: (spanIds: readonly string[]) => string;
  fn: (id: string) => string;
  tie: (id: string) => string;
  tenant: (id: string) => string;
  slice: (id: string) => string;
};

export const SAME_SITE_PATH = 'no spans (both ends on one site)';

/** The sites a path passes in order, or null when a span is unknown or the spans do not join up. */
export function chainOfSites(ends: readonly ({ a: string; b: string } | undefined)[]): string[] | null {
  if (ends.length === 0 || ends.some((e) => !e)) return null;
  const spans = ends as { a: string; b: string }[];
  const [first, second] = spans;
  // Start from the end of the first span that the second one does not touch.
  let at = second && (second.a === first.a || second.b === first.a) ? first.b : first.a;
  const chain = [at];
  for (const span of spans) {
    if (span.a !== at && span.b !== at) return null;
    at = span.a === at ? span.b : span.a;
    chain.push(at);
  }
  return chain;
}

/** Unknown sites and spans read as "an unlisted site/span" rather than as internal ids. */
export function packNames(t: PackNameTables): PackNames {
  const site = (id: string) => t.sites.get(id) ?? 'an unlisted site';
  const span = (id: string) => {
    const e = t.spanEnds.get(id);
    return e ? `${site(e.a)} – ${site(e.b)}` : 'an unlisted span';
  };
  const path = (ids: readonly string[]) => {
    if (ids.length === 0) return SAME_SITE_PATH;
    const chain = chainOfSites(ids.map((id) => t.spanEnds.get(id)));
    return chain ? chain.map(site).join(' → ') : ids.map(span).join(', ');
  };
  const fn = (id: string) => t.functions.get(id) ?? 'unnamed function';
  const tie = (id: string) => {
    const ends = t.tieEnds.get(id);
    return ends ? `the link ${fn(ends.from)} – ${fn(ends.to)}` : 'a link';
  };
  return {
    site, path, fn, tie,
    tenant: (id) => t.tenants.get(id) ?? 'an unlisted tenant',
    slice: (id) => t.slices.get(id) ?? 'an unlisted slice',
  };
}
