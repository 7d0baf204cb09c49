// The network map: sites with coordinates and compute load, spans with bandwidth load, and the coastline outline.
// A tenant user gets only the part of the network its own slices use (the server decides).
import { useQuery } from '@tanstack/react-query';
import { networkMapSchema } from '@/shared/inventory';
import { apiFetch } from '@/hooks/api-fetch';

const NETWORK_MAP_ROOT = ['network-map'] as const;

/** Key of the map; invalidate it after an import or an accepted plan changes the network or its load. */
export const networkMapKey = () => NETWORK_MAP_ROOT;

export function useNetworkMapQuery() {
  return useQuery({ queryKey: networkMapKey(), queryFn: () => apiFetch('/api/network/map', networkMapSchema) });
}
