// Site id → name, from the map data most screens have already fetched; unknown ids read as themselves.
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
