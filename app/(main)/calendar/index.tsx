// Calendar: the visible month's windows (GET /api/windows?from=&to=) and freezes, with the selected day's agenda.
// A tenant user's calendar holds the work it was notified of, as tenant views, and opens their notices.
import { useLocalSearchParams, useRouter, type Href } from 'expo-router';
import { useMeQuery } from '@/hooks/queries/me';
import { useFreezesQuery } from '@/hooks/queries/freezes';
import { useTenantWindowsQuery } from '@/hooks/queries/tenant-windows';
import { useTenantChoicesQuery, useWindowsListQuery } from '@/hooks/queries/windows-list';
import { ErrorState, LoadingState } from '@/components/screen-states';
import { CalendarView } from '@/components/calendar/calendar-view';
import { noticeIdOf, tenantCalendarWindows } from '@/components/calendar/tenant-calendar';
import { useCalendarState } from '@/components/calendar/use-calendar-state';
import { listParams } from '@/components/calendar/window-filters';
import { canBookWindows, canReadCampaigns, canSearchSlots, isOperator, tenantScopeOf } from '@/shared/permissions';
import { visibleRange } from '@/components/time';
import { useViewerTimeZone } from '@/components/time/use-viewer-time-zone';
import { usePageTitle } from '@/components/page-title';
import { useElementNames } from '@/components/inventory/use-site-names';
import { useCampaignsQuery } from '@/hooks/queries/campaigns';
import { campaignIdOf, draftCalendarWindows } from '@/components/campaigns/campaign-calendar';

export default function CalendarScreen() {
  const router = useRouter();
  const timeZone = useViewerTimeZone();
  // ?day=YYYY-MM-DD opens on that day (a campaign's "Show on calendar").
  const { day } = useLocalSearchParams<{ day?: string }>();
  const state = useCalendarState(timeZone, day && /^\d{4}-\d{2}-\d{2}$/.test(day) ? day : undefined);
  const me = useMeQuery().data;
  const roles = me?.roles ?? [];
  const tenant = me !== undefined && tenantScopeOf(me) !== null;
  const range = visibleRange(state.month, timeZone);
  const staffWindows = useWindowsListQuery(listParams(range, state.filters), me !== undefined && !tenant);
  const tenantWindows = useTenantWindowsQuery(range, tenant);
  const freezes = useFreezesQuery(isOperator(roles));
  const tenants = useTenantChoicesQuery(isOperator(roles));
  // Draft campaigns show as outlined bars for the people who schedule or read them.
  const drafts = useCampaignsQuery({ status: 'draft', from: range.from, to: range.to }, canReadCampaigns(roles));
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
  const staffHref = (id: string): Href => {
    const campaignId = campaignIdOf(id);
    return campaignId ? { pathname: '/campaigns/[id]', params: { id: campaignId } } : { pathname: '/windows/[id]', params: { id } };
  };
  const windowHref = tenant ? tenantWorkHref : staffHref;
  return (
    <CalendarView
      state={state}
      timeZone={timeZone}
      windows={tenant ? tenantCalendarWindows(views) : [...staffWindows.data?.windows ?? [], ...draftCalendarWindows(drafts.data?.campaigns ?? [])]}
      freezes={freezes.data?.freezes ?? []}
      tenants={tenants.data ?? []}
      refreshing={windows.isFetching}
      refreshError={windows.isError ? windows.error.message : undefined}
      canBook={canBookWindows(roles)}
      showFilters={!tenant}
      onBook={() => router.push('/windows/new')}
      onFindSlot={canSearchSlots(roles) ? () => router.push('/slots') : undefined}
      windowHref={windowHref}
      elementName={elementName}
    />
  );
}
