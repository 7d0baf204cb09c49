// Readable names for sites and spans in a plan, from the network map most screens have already fetched.
import { useMemo } from 'react';
import { useNetworkMapQuery } from '@/hooks/queries/network-map';

export type ElementNames = {
  site: (id: string) => string;
  span: (id: string) => string;
  /** "Ambrymarsh – Orrindale – Castrenholm" along a path's spans; "(no spans)" for a tie inside one site */
  path: (spanIds: readonly string[]) => string;
};

type MapLike = { sites: readonly { id: string; name: string }[]; spans: readonly { id: string; a: string; b: string }[] };

type SpanEnds = { a: string; b: string } | undefined;

/** The sites a path passes through in order, or null when a span is unknown or the spans do not join up. */
export function siteChain(spans: readonly SpanEnds[]): string[] | null {
  if (spans.some((s) => !s)) return null;
  const ends = spans as { a: string; b: string }[];
  const first = ends[0];
  const second = ends[1];
  // Start from the end of the first span that the second span does not touch.
  let at = second && (second.a === first.a || second.b === first.a) ? first.b : first.a;
  const chain = [at];
  for (const span of ends) {
    if (span.a !== at && span.b !== at) return null;
    at = span.a === at ? span.b : span.a;
    chain.push(at);
  }
  return chain;
}

/** Pure so tests can check it; unknown ids read as themselves. */
export function elementNames(map: MapLike | undefined): ElementNames {
  const sites = new Map((map?.sites ?? []).map((s) => [s.id, s.name]));
  const spans = new Map((map?.spans ?? []).map((s) => [s.id, s]));
  const site = (id: string) => sites.get(id) ?? id;
  const span = (id: string) => {
    const s = spans.get(id);
    return s ? `${site(s.a)} – ${site(s.b)}` : id;
  };
  const path = (ids: readonly string[]) => {
    if (ids.length === 0) return '(inside one site)';
    const chain = siteChain(ids.map((id) => spans.get(id)));
    return chain ? chain.map(site).join(' → ') : ids.map(span).join(', ');
  };
  return { site, span, path };
}

export function useElementNames(): ElementNames {
  const map = useNetworkMapQuery();
  return useMemo(() => elementNames(map.data), [map.data]);
}
