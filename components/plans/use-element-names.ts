// Readable names for what a plan moves: sites and spans from the network map most screens have already fetched,
// functions and links from the plan's slices (people read names, never internal ids).
import { useMemo } from 'react';
import { useQueries } from '@tanstack/react-query';
import { sliceDetailSchema } from '@/shared/inventory';
import { apiFetch } from '@/hooks/api-fetch';
import { useNetworkMapQuery } from '@/hooks/queries/network-map';
import { sliceKey } from '@/hooks/queries/slices';

export type ElementNames = {
  site: (id: string) => string;
  span: (id: string) => string;
  /** "Ambrymarsh → Orrindale → Castrenholm" along a path's spans; "no spans (both ends on one site)" for none */
  path: (spanIds: readonly string[]) => string;
  /** a function's own name ("User plane"); "a function" while its slice is not known */
  fn: (id: string) => string;
  /** a link by the functions at its ends: "the link IoT gateway – User plane" */
  tie: (id: string) => string;
};

/** Function names and link ends of the plan's slices, as the slice details give them. */
export type SliceParts = {
  functions: ReadonlyMap<string, string>;
  ties: ReadonlyMap<string, { from: string; to: string }>;
};

const NO_PARTS: SliceParts = { functions: new Map(), ties: new Map() };

export const SAME_SITE_PATH = 'no spans (both ends on one site)';

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
export function elementNames(map: MapLike | undefined, parts: SliceParts = NO_PARTS): ElementNames {
  const sites = new Map((map?.sites ?? []).map((s) => [s.id, s.name]));
  const spans = new Map((map?.spans ?? []).map((s) => [s.id, s]));
  const site = (id: string) => sites.get(id) ?? id;
  const span = (id: string) => {
    const s = spans.get(id);
    return s ? `${site(s.a)} – ${site(s.b)}` : id;
  };
  const path = (ids: readonly string[]) => {
    if (ids.length === 0) return SAME_SITE_PATH;
    const chain = siteChain(ids.map((id) => spans.get(id)));
    return chain ? chain.map(site).join(' → ') : ids.map(span).join(', ');
  };
  const fn = (id: string) => parts.functions.get(id) ?? 'a function';
  const tie = (id: string) => {
    const ends = parts.ties.get(id);
    return ends ? `the link ${fn(ends.from)} – ${fn(ends.to)}` : 'a link';
  };
  return { site, span, path, fn, tie };
}

/** Function names ("User plane") and link ends of the given slices, from their details. */
export function slicePartsFrom(details: readonly ({ functions: { id: string; name: string | null }[]; ties: { id: string; from: string; to: string }[] } | undefined)[]): SliceParts {
  const functions = new Map<string, string>();
  const ties = new Map<string, { from: string; to: string }>();
  for (const d of details) {
    d?.functions.forEach((f) => functions.set(f.id, f.name ?? 'unnamed function'));
    d?.ties.forEach((t) => ties.set(t.id, { from: t.from, to: t.to }));
  }
  return { functions, ties };
}

export function useElementNames(sliceIds: readonly string[] = []): ElementNames {
  const map = useNetworkMapQuery();
  const details = useQueries({
    queries: sliceIds.map((id) => ({
      queryKey: sliceKey(id),
      queryFn: () => apiFetch(`/api/slices/${encodeURIComponent(id)}`, sliceDetailSchema),
    })),
  });
  const data = details.map((d) => d.data);
  const dataKey = data.map((d) => (d ? d.slice.id : '')).join('|');
  // eslint-disable-next-line react-hooks/exhaustive-deps -- `data` is a new array each render; its loaded ids say when it changed
  const parts = useMemo(() => slicePartsFrom(data), [dataKey]);
  return useMemo(() => elementNames(map.data, parts), [map.data, parts]);
}
