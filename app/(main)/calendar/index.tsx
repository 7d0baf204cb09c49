// Calendar: the visible month's windows (GET /api/windows?from=&to=) and freezes, with the selected day's agenda.
import { useRouter } from 'expo-router';
import { useMeQuery } from '@/hooks/queries/me';
import { useFreezesQuery } from '@/hooks/queries/freezes';
import { useTenantChoicesQuery, useWindowsListQuery } from '@/hooks/queries/windows-list';
import { ErrorState, LoadingState } from '@/components/screen-states';
import { CalendarView } from '@/components/calendar/calendar-view';
import { useCalendarState } from '@/components/calendar/use-calendar-state';
import { listParams } from '@/components/calendar/window-filters';
import { canBookWindows, isOperator } from '@/shared/permissions';
import { viewerTimeZone, visibleRange } from '@/components/time';

export default function CalendarScreen() {
  const router = useRouter();
  const timeZone = viewerTimeZone();
  const state = useCalendarState(timeZone);
  const roles = useMeQuery().data?.roles ?? [];
  const windows = useWindowsListQuery(listParams(visibleRange(state.month, timeZone), state.filters));
  const freezes = useFreezesQuery(isOperator(roles));
  const tenants = useTenantChoicesQuery(isOperator(roles));

  if (windows.isError && !windows.data) return <ErrorState message={windows.error.message} onRetry={() => void windows.refetch()} />;
  if (!windows.data) return <LoadingState label="Loading the calendar…" />;
  return (
    <CalendarView
      state={state}
      timeZone={timeZone}
      windows={windows.data.windows}
      freezes={freezes.data?.freezes ?? []}
      tenants={tenants.data ?? []}
      refreshing={windows.isFetching}
      refreshError={windows.isError ? windows.error.message : undefined}
      canBook={canBookWindows(roles)}
      onBook={() => router.push('/windows/new')}
      onOpenWindow={(id) => router.push(`/windows/${encodeURIComponent(id)}`)}
    />
  );
}
