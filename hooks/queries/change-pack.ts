// The change-board pack of one window (GET /api/windows/:id/pack) and the address of its moves CSV.
import { useQuery } from '@tanstack/react-query';
import { changePackSchema } from '@/shared/change-pack';
import { apiFetch } from '@/hooks/api-fetch';

const ROOT = ['change-pack'] as const;
export const changePackKey = (windowId: string) => [...ROOT, windowId] as const;

const packPath = (windowId: string) => `/api/windows/${encodeURIComponent(windowId)}`;

export function useChangePackQuery(windowId: string) {
  // A pack is printed as it stands when opened; a fresh copy each time the screen mounts, none while it is open.
  return useQuery({
    queryKey: changePackKey(windowId), queryFn: () => apiFetch(`${packPath(windowId)}/pack`, changePackSchema),
    staleTime: 0, refetchOnWindowFocus: false,
  });
}

/** The moves CSV; the browser downloads it (Content-Disposition: attachment). */
export function movesCsvUrl(windowId: string): string {
  return `${packPath(windowId)}/moves.csv`;
}
