// Overview figures: counts of the network, tenants, slices and the coming windows (a tenant's own, and its notified work).
import { useQuery } from '@tanstack/react-query';
import { anyOverviewSchema } from '@/shared/tenant-windows';
import { apiFetch } from '@/hooks/api-fetch';

const OVERVIEW_ROOT = ['overview'] as const;

/** Key of the overview figures; invalidate it after any change to windows, slices or the network. */
export const overviewKey = () => [...OVERVIEW_ROOT] as const;

export function useOverviewQuery() {
  return useQuery({ queryKey: overviewKey(), queryFn: () => apiFetch('/api/overview', anyOverviewSchema) });
}
