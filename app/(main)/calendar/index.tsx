// Calendar: the visible month's windows (GET /api/windows?from=&to=) and freezes, with the selected day's agenda.
// A tenant user's calendar holds the work it was notified of, as tenant views, and opens their notices.
import { useRouter, type Href } from 'expo-router';
import { useMeQuery } from '@/hooks/queries/me';
import { useFreezesQuery } from '@/hooks/queries/freezes';
import { useTenantWindowsQuery } from '@/hooks/queries/tenant-windows';
import { useTenantChoicesQuery, useWindowsListQuery } from '@/hooks/queries/windows-list';
import { ErrorState, LoadingState } from '@/components/screen-states';
import { CalendarView } from '@/components/calendar/calendar-view';
import { noticeIdOf, tenantCalendarWindows } from '@/components/calendar/tenant-calendar';
import { useCalendarState } from '@/components/calendar/use-calendar-state';
import { listParams } from '@/components/calendar/window-filters';
import { canBookWindows, isOperator, tenantScopeOf } from '@/shared/permissions';
import { visibleRange } from '@/components/time';
import { useViewerTimeZone } from '@/components/time/use-viewer-time-zone';
import { usePageTitle } from '@/components/page-title';
import { useElementNames } from '@/components/inventory/use-site-names';

export default function CalendarScreen() {
  const router = useRouter();
  const timeZone = useViewerTimeZone();
  const state = useCalendarState(timeZone);
  const me = useMeQuery().data;
  const roles = me?.roles ?? [];
  const tenant = me !== undefined && tenantScopeOf(me) !== null;
  const range = visibleRange(state.month, timeZone);
  const staffWindows = useWindowsListQuery(listParams(range, state.filters), me !== undefined && !tenant);
  const tenantWindows = useTenantWindowsQuery(range, tenant);
  const freezes = useFreezesQuery(isOperator(roles));
  const tenants = useTenantChoicesQuery(isOperator(roles));
  const windows = tenant ? tenantWindows : staffWindows;
  usePageTitle('Calendar');
  const elementName = useElementNames();

  if (windows.isError && !windows.data) return <ErrorState message={windows.error.message} onRetry={() => void windows.refetch()} />;
  if (!windows.data) return <LoadingState label="Loading the calendar…" />;
  const views = tenantWindows.data?.windows ?? [];
  const tenantWorkHref = (windowId: string): Href | null => {
    const id = noticeIdOf(views, windowId);
    return id ? { pathname: '/notices/[id]', params: { id } } : null;
  };
  const windowHref = tenant ? tenantWorkHref : (id: string): Href => ({ pathname: '/windows/[id]', params: { id } });
  return (
    <CalendarView
      state={state}
      timeZone={timeZone}
      windows={tenant ? tenantCalendarWindows(views) : staffWindows.data?.windows ?? []}
      freezes={freezes.data?.freezes ?? []}
      tenants={tenants.data ?? []}
      refreshing={windows.isFetching}
      refreshError={windows.isError ? windows.error.message : undefined}
      canBook={canBookWindows(roles)}
      showFilters={!tenant}
      onBook={() => router.push('/windows/new')}
      windowHref={windowHref}
      elementName={elementName}
    />
  );
}
