// What a tenant user reads about maintenance on its slices: tenant views of the windows it was notified of
// (GET /api/windows and /api/windows/:id answer these to tenant users; shared/tenant-windows.ts).
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { tenantWindowListSchema, tenantWindowViewSchema } from '@/shared/tenant-windows';
import { apiFetch } from '@/hooks/api-fetch';
import { windowListPath, windowsKey } from '@/hooks/queries/windows-list';

/** Under windowsKey(), so the invalidations after window and notice changes reach these too. */
const tenantWindowsKey = (range: { from: string; to: string }) => [...windowsKey(), 'tenant-list', range] as const;
const tenantWindowKey = (id: string) => [...windowsKey(), 'tenant-detail', id] as const;

export function useTenantWindowsQuery(range: { from: string; to: string }, enabled: boolean) {
  return useQuery({
    queryKey: tenantWindowsKey({ from: range.from, to: range.to }),
    queryFn: () => apiFetch(windowListPath({ from: range.from, to: range.to }), tenantWindowListSchema),
    enabled,
    // Keep last month's work on screen while the next month loads, as the staff calendar does.
    placeholderData: keepPreviousData,
  });
}

export function useTenantWindowQuery(id: string) {
  return useQuery({
    queryKey: tenantWindowKey(id),
    queryFn: () => apiFetch(`/api/windows/${encodeURIComponent(id)}`, tenantWindowViewSchema),
    // A 404 means the tenant was not notified of this window: asking again will not change that.
    retry: false,
  });
}
