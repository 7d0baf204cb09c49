// Windows over a time range for the calendar (GET /api/windows?from=&to=), and the tenants its filter offers.
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { windowListSchema } from '@/shared/windows';
import { tenantListSchema, MAX_PAGE_SIZE } from '@/shared/inventory';
import { apiFetch } from '@/hooks/api-fetch';

const WINDOWS_ROOT = ['windows'] as const;

/**
 * Root key of everything cached about windows (lists here, single windows in hooks/queries/windows.ts).
 * Invalidate it after any booking, edit, transition or freeze change so calendars and details refetch.
 */
export const windowsKey = () => [...WINDOWS_ROOT] as const;

export type WindowListParams = {
  /** UTC instants, `from` inclusive, `to` exclusive */
  from: string;
  to: string;
  mine?: boolean;
  statuses?: readonly string[];
  element?: string;
  tenant?: string;
};

/** Key of one list; everything under windowsKey() so one invalidation reaches it. */
export const windowsListKey = (params: WindowListParams) => [...WINDOWS_ROOT, 'list', params] as const;

/** The query string the API expects: empty filters are left out, statuses comma-separated. */
export function windowListPath(params: WindowListParams): string {
  const query = new URLSearchParams({ from: params.from, to: params.to });
  if (params.mine) query.set('mine', 'true');
  if (params.statuses && params.statuses.length > 0) query.set('status', params.statuses.join(','));
  if (params.element) query.set('element', params.element);
  if (params.tenant) query.set('tenant', params.tenant);
  return `/api/windows?${query.toString()}`;
}

/** `enabled` is false for tenant users, whose list holds tenant views (hooks/queries/tenant-windows.ts). */
export function useWindowsListQuery(params: WindowListParams, enabled = true) {
  return useQuery({
    queryKey: windowsListKey(params),
    queryFn: () => apiFetch(windowListPath(params), windowListSchema),
    enabled,
    // Keep last month's bars on screen while the next month loads, instead of flashing a spinner.
    placeholderData: keepPreviousData,
  });
}

const TENANT_CHOICES_KEY = ['tenants', 'choices'] as const;

/** Tenants for the calendar's "tenant affected" filter; staff only (a tenant user sees only its own windows). */
export function useTenantChoicesQuery(enabled: boolean) {
  return useQuery({
    queryKey: TENANT_CHOICES_KEY,
    queryFn: () => apiFetch(`/api/tenants?pageSize=${MAX_PAGE_SIZE}&sort=name`, tenantListSchema),
    enabled,
    select: (list) => list.items.map((tenant) => ({ id: tenant.id, name: tenant.name })),
  });
}
