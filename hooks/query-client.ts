// The app's one QueryClient; each default says why it is set.
import { QueryClient } from '@tanstack/react-query';
import { isApiError } from './api-fetch';

/** Figures on screen may be this old before a remount or focus fetches them again. */
export const QUERY_STALE_TIME_MS = 30_000;
/** Unused results stay cached this long so that going back to a screen is instant. */
export const QUERY_GC_TIME_MS = 5 * 60_000;
/** Transient failures (network, 5xx) get this many quiet retries before the screen shows an error. */
export const QUERY_MAX_RETRIES = 2;

function shouldRetry(failureCount: number, error: unknown): boolean {
  // A 4xx (signed out, forbidden, not found, invalid) will not change by asking again.
  if (isApiError(error) && error.status >= 400 && error.status < 500) return false;
  return failureCount < QUERY_MAX_RETRIES;
}

export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        retry: shouldRetry,
        // Short stale time: windows and plans change under other people's hands during the day.
        staleTime: QUERY_STALE_TIME_MS,
        gcTime: QUERY_GC_TIME_MS,
        // Coming back to the tab after a while should show current figures, not this morning's.
        refetchOnWindowFocus: true,
      },
      mutations: {
        // Never repeat a write on its own: sign-in is rate limited and other writes are not idempotent.
        retry: false,
      },
    },
  });
}
