// Slices: the paged list with tenant, service type, priority and critical filters, and one slice in full.
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import type { z } from 'zod';
import { sliceDetailSchema, sliceListQuerySchema, sliceListSchema } from '@/shared/inventory';
import { apiFetch } from '@/hooks/api-fetch';
import { listQueryString } from '@/hooks/queries/list-params';

/** Unset fields take the server's defaults (page 1, DEFAULT_PAGE_SIZE a page, first sort key, ascending). */
export type SliceListParams = Partial<z.infer<typeof sliceListQuerySchema>>;

const SLICES_ROOT = ['slices'] as const;

/** Everything about slices; invalidate it after an import or an accepted plan. */
export const slicesKey = () => SLICES_ROOT;
export const sliceListKey = (params: SliceListParams) => [...SLICES_ROOT, 'list', params] as const;
export const sliceKey = (id: string) => [...SLICES_ROOT, 'detail', id] as const;

export function useSlicesQuery(params: SliceListParams) {
  return useQuery({
    queryKey: sliceListKey(params),
    queryFn: () => apiFetch(`/api/slices${listQueryString(params)}`, sliceListSchema),
    // Keep the current page on screen while a new filter loads.
    placeholderData: keepPreviousData,
  });
}

export function useSliceQuery(id: string) {
  return useQuery({
    queryKey: sliceKey(id),
    queryFn: () => apiFetch(`/api/slices/${encodeURIComponent(id)}`, sliceDetailSchema),
    enabled: id !== '',
  });
}
