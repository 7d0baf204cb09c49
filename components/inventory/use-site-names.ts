// Site id → name (and a span's name from its ends), from the map data most screens have already fetched; unknown
// ids read as themselves.
import { useMemo } from 'react';
import { useNetworkMapQuery } from '@/hooks/queries/network-map';

export function useSiteNames(known: readonly { id: string | null; name: string | null }[] = []): (id: string) => string {
  const map = useNetworkMapQuery();
  return useMemo(() => {
    const names = new Map<string, string>();
    for (const site of map.data?.sites ?? []) names.set(site.id, site.name);
    for (const { id, name } of known) if (id && name) names.set(id, name);
    return (id: string) => names.get(id) ?? id;
  }, [map.data, known]);
}

/** A site's name, or a span's as its two ends ("Orrindale – Vellaport"), from the map data. */
export function useElementNames(): (kind: 'site' | 'span', id: string) => string {
  const map = useNetworkMapQuery();
  const siteName = useSiteNames();
  return useMemo(() => {
    const spans = new Map((map.data?.spans ?? []).map((span) => [span.id, span]));
    return (kind: 'site' | 'span', id: string) => {
      if (kind === 'site') return siteName(id);
      const span = spans.get(id);
      return span ? `${siteName(span.a)} – ${siteName(span.b)}` : id;
    };
  }, [map.data, siteName]);
}
