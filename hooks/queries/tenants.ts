// Tenants: the list (for the slice filter and the tenants table) and one tenant with its slices.
import { useQuery } from '@tanstack/react-query';
import type { z } from 'zod';
import { MAX_PAGE_SIZE, tenantDetailSchema, tenantListQuerySchema, tenantListSchema } from '@/shared/inventory';
import { apiFetch } from '@/hooks/api-fetch';
import { listQueryString } from '@/hooks/queries/list-params';

/** Unset fields take the server's defaults (page 1, DEFAULT_PAGE_SIZE a page, first sort key, ascending). */
export type TenantListParams = Partial<z.infer<typeof tenantListQuerySchema>>;

const TENANTS_ROOT = ['tenants'] as const;

/** Everything about tenants; invalidate it after an import. */
export const tenantsKey = () => TENANTS_ROOT;
export const tenantListKey = (params: TenantListParams) => [...TENANTS_ROOT, 'list', params] as const;
export const tenantKey = (id: string) => [...TENANTS_ROOT, 'detail', id] as const;

/** Defaults to one page of the largest size: a handful of tenants fits a filter menu. */
export function useTenantsQuery(params: TenantListParams = { pageSize: MAX_PAGE_SIZE, sort: 'name' }) {
  return useQuery({
    queryKey: tenantListKey(params),
    queryFn: () => apiFetch(`/api/tenants${listQueryString(params)}`, tenantListSchema),
  });
}

export function useTenantQuery(id: string) {
  return useQuery({
    queryKey: tenantKey(id),
    queryFn: () => apiFetch(`/api/tenants/${encodeURIComponent(id)}`, tenantDetailSchema),
    enabled: id !== '',
  });
}
