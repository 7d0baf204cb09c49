// Overview figures: counts of the network, tenants, slices and the coming windows.
import { useQuery } from '@tanstack/react-query';
import { overviewSchema } from '@/shared/api';
import { apiFetch } from '@/hooks/api-fetch';

const OVERVIEW_ROOT = ['overview'] as const;

/** Key of the overview figures; invalidate it after any change to windows, slices or the network. */
export const overviewKey = () => [...OVERVIEW_ROOT] as const;

export function useOverviewQuery() {
  return useQuery({ queryKey: overviewKey(), queryFn: () => apiFetch('/api/overview', overviewSchema) });
}
