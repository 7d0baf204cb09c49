// Spans: the paged, sortable list with bandwidth load, and one span with the slices whose ties use it.
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import type { z } from 'zod';
import { spanDetailSchema, spanListQuerySchema, spanListSchema } from '@/shared/inventory';
import { apiFetch } from '@/hooks/api-fetch';
import { listQueryString } from '@/hooks/queries/list-params';

/** Unset fields take the server's defaults (page 1, DEFAULT_PAGE_SIZE a page, first sort key, ascending). */
export type SpanListParams = Partial<z.infer<typeof spanListQuerySchema>>;

const SPANS_ROOT = ['spans'] as const;

/** Everything about spans; invalidate it after an import changes the network. */
export const spansKey = () => SPANS_ROOT;
export const spanListKey = (params: SpanListParams) => [...SPANS_ROOT, 'list', params] as const;
export const spanKey = (id: string) => [...SPANS_ROOT, 'detail', id] as const;

export function useSpansQuery(params: SpanListParams) {
  return useQuery({
    queryKey: spanListKey(params),
    queryFn: () => apiFetch(`/api/spans${listQueryString(params)}`, spanListSchema),
    // Keep the current page on screen while the next sort or search loads.
    placeholderData: keepPreviousData,
  });
}

export function useSpanQuery(id: string) {
  return useQuery({
    queryKey: spanKey(id),
    queryFn: () => apiFetch(`/api/spans/${encodeURIComponent(id)}`, spanDetailSchema),
    enabled: id !== '',
  });
}
