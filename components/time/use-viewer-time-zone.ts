// The zone the signed-in person reads times in: their own choice from GET /api/me, else the network's zone.
// Every screen takes its zone from here, so one window reads the same on every screen for one viewer.
import { useMeQuery } from '@/hooks/queries/me';
import { NETWORK_TIME_ZONE } from '@/shared/time-zone';

export function useViewerTimeZone(): string {
  const me = useMeQuery();
  return me.data?.timeZone ?? NETWORK_TIME_ZONE;
}
