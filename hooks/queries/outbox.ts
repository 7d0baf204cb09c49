// Outbox (admin): the messages the local SMTP sink kept, newest first, and one message parsed.
import { useInfiniteQuery, useQuery } from '@tanstack/react-query';
import { outboxListSchema, outboxMessageSchema, type OutboxList } from '@/shared/outbox';
import { apiFetch } from '@/hooks/api-fetch';

const OUTBOX_ROOT = ['outbox'] as const;
const OUTBOX_PAGE_SIZE = 30;
// Mail arrives from the queue's worker in the background; look again now and then while the Outbox is open.
const OUTBOX_REFRESH_MS = 10_000;

/** Key of everything under the Outbox; invalidate it to see new mail at once. */
export const outboxKey = () => [...OUTBOX_ROOT] as const;
export const outboxListKey = () => [...OUTBOX_ROOT, 'list'] as const;
export const outboxMessageKey = (id: number) => [...OUTBOX_ROOT, 'message', id] as const;

/** The raw message's address (message/rfc822), for a download link. */
export const outboxRawPath = (id: number) => `/api/outbox/${id}/raw`;

export function useOutboxListQuery() {
  return useInfiniteQuery({
    queryKey: outboxListKey(),
    initialPageParam: 1,
    queryFn: ({ pageParam }) => apiFetch(`/api/outbox?page=${pageParam}&pageSize=${OUTBOX_PAGE_SIZE}`, outboxListSchema),
    getNextPageParam: (last: OutboxList) => (last.page * last.pageSize < last.total ? last.page + 1 : undefined),
    refetchInterval: OUTBOX_REFRESH_MS,
  });
}

export function useOutboxMessageQuery(id: number) {
  return useQuery({
    queryKey: outboxMessageKey(id),
    queryFn: () => apiFetch(`/api/outbox/${id}`, outboxMessageSchema),
    enabled: Number.isInteger(id) && id > 0,
    // A stored message never changes.
    staleTime: Infinity,
  });
}
