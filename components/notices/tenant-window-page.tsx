// What a tenant user sees on an internal window address (/windows/...): the work in its notice's words with a
// way to the notice, or a clear "not available" when it was not notified of that window. The internal window
// pages never render for tenants: each route under app/(main)/windows/ is wrapped in staffWindowPage.
import type { ComponentType } from 'react';
import { usePathname, useRouter } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';
import { useMeQuery } from '@/hooks/queries/me';
import { tenantScopeOf } from '@/shared/permissions';
import { useTenantWindowQuery } from '@/hooks/queries/tenant-windows';
import { Button } from '@/components/button';
import { titleWithName, usePageTitle } from '@/components/page-title';
import { EmptyState, LoadingState } from '@/components/screen-states';
import { timesInLabel } from '@/components/time';
import { useViewerTimeZone } from '@/components/time/use-viewer-time-zone';
import { ZonedWhen } from '@/components/time/zoned-when';
import { colors, space, type } from '@/constants/theme';

/** The window id in `/windows/<id>/...`, or null for `/windows/new` and other addresses. */
export function windowIdFromPath(pathname: string): string | null {
  const match = /^\/windows\/([^/]+)/.exec(pathname);
  if (!match || match[1] === 'new') return null;
  return decodeURIComponent(match[1]);
}

const NOT_AVAILABLE = {
  title: 'This page is not available to tenants',
  hint: 'Planned work on your slices is under Notices once we have sent you its notice.',
};

/**
 * A window route for staff; a tenant user reaching its address gets TenantWindowPage instead. The choice is made
 * inside the route, not in a layout above it: a layout that leaves its Slot unrendered lets the router resolve the
 * address to another route of the folder (a tenant's /windows/w-1 became /windows/new?id=w-1).
 */
export function staffWindowPage(StaffScreen: ComponentType): ComponentType {
  function WindowPageForViewer() {
    const me = useMeQuery();
    if (me.data && tenantScopeOf(me.data) !== null) return <TenantWindowRoute />;
    return <StaffScreen />;
  }
  WindowPageForViewer.displayName = `staffWindowPage(${StaffScreen.displayName ?? StaffScreen.name})`;
  return WindowPageForViewer;
}

function TenantWindowRoute() {
  const pathname = usePathname();
  const router = useRouter();
  return <TenantWindowPage pathname={pathname} onOpenNotice={(id) => router.push({ pathname: '/notices/[id]', params: { id } })} />;
}

export function TenantWindowPage({ pathname, onOpenNotice }: { pathname: string; onOpenNotice: (noticeId: string) => void }) {
  const id = windowIdFromPath(pathname);
  if (id === null) return <NotAvailable />;
  return <TenantWindowSummary id={id} onOpenNotice={onOpenNotice} />;
}

function NotAvailable() {
  usePageTitle('Planned work');
  return <EmptyState page {...NOT_AVAILABLE} />;
}

function TenantWindowSummary({ id, onOpenNotice }: { id: string; onOpenNotice: (noticeId: string) => void }) {
  const view = useTenantWindowQuery(id);
  usePageTitle(titleWithName('Planned work', view.data?.summary));
  const timeZone = useViewerTimeZone();
  if (view.isError) return <NotAvailable />;
  if (!view.data) return <LoadingState label="Loading the planned work…" />;
  const work = view.data;
  return (
    <View style={styles.page} testID="tenant-window">
      <Text style={styles.title} role="heading" aria-level={1}>{work.summary}</Text>
      <Text style={styles.body}>{timesInLabel(timeZone)}</Text>
      <ZonedWhen startsAt={work.startsAt} endsAt={work.endsAt} timeZone={timeZone} style={styles.body} testID="tenant-window-when" />
      <Text style={styles.body}>{work.effectText}</Text>
      <Button label="Open the notice" onPress={() => onOpenNotice(work.noticeId)} testID="tenant-window-open-notice" />
    </View>
  );
}

const styles = StyleSheet.create({
  page: { padding: space.lg, gap: space.md, maxWidth: 640 },
  title: { ...type.title, color: colors.ink },
  body: { ...type.body, color: colors.ink },
});
