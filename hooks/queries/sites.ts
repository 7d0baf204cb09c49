// Sites: the paged, sortable list with compute load, and one site with its spans and the slices it carries.
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import type { z } from 'zod';
import { siteDetailSchema, siteListQuerySchema, siteListSchema } from '@/shared/inventory';
import { apiFetch } from '@/hooks/api-fetch';
import { listQueryString } from '@/hooks/queries/list-params';

/** Unset fields take the server's defaults (page 1, DEFAULT_PAGE_SIZE a page, first sort key, ascending). */
export type SiteListParams = Partial<z.infer<typeof siteListQuerySchema>>;

const SITES_ROOT = ['sites'] as const;

/** Everything about sites; invalidate it after an import changes the network. */
export const sitesKey = () => SITES_ROOT;
export const siteListKey = (params: SiteListParams) => [...SITES_ROOT, 'list', params] as const;
export const siteKey = (id: string) => [...SITES_ROOT, 'detail', id] as const;

export function useSitesQuery(params: SiteListParams) {
  return useQuery({
    queryKey: siteListKey(params),
    queryFn: () => apiFetch(`/api/sites${listQueryString(params)}`, siteListSchema),
    // Keep the current page on screen while the next sort or search loads, so the table does not flash.
    placeholderData: keepPreviousData,
  });
}

export function useSiteQuery(id: string) {
  return useQuery({
    queryKey: siteKey(id),
    queryFn: () => apiFetch(`/api/sites/${encodeURIComponent(id)}`, siteDetailSchema),
    enabled: id !== '',
  });
}
