// The tenant portal's list side: a title, the zone times are shown in, then the list or its state.
import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, Text, View } from 'react-native';
import type { PortalWork } from '@/shared/notices';
import { ListPane } from '@/components/inventory/list-pane';
import { CalendarFeedLink } from '@/components/security/calendar-feed-link';
import { timesInLabel } from '@/components/time';
import { useViewerTimeZone } from '@/components/time/use-viewer-time-zone';
import { colors, space, type } from '@/constants/theme';
import { PortalWorkRow } from './portal-work-row';

export function PortalWorkPane({ children }: { children: ReactNode }) {
  return (
    <ListPane title="Planned work" hint="Maintenance that touches your slices, and the notices we sent you about it." testID="notices-pane">
      <CalendarFeedLink what="this planned work" />
      {children}
    </ListPane>
  );
}

type ListProps = { work: PortalWork; selectedId: string | null; onOpen: (noticeId: string) => void };

export function PortalWorkList({ work, selectedId, onOpen }: ListProps) {
  const timeZone = useViewerTimeZone();
  return (
    <ScrollView contentContainerStyle={styles.list} testID="notices-list">
      <Text style={styles.zone} testID="notices-zone">{timesInLabel(timeZone)}</Text>
      <View role="list" aria-label="Planned work" style={styles.items}>
        {work.items.map((item) => (
          <View role="listitem" key={item.windowId}>
            <PortalWorkRow item={item} timeZone={timeZone} selected={item.notice?.id === selectedId} onOpen={onOpen} />
          </View>
        ))}
      </View>
    </ScrollView>
  );
}

/** The notice id in a portal path (/notices/ntc-…), or null on the list itself. */
export function noticeIdFromPath(pathname: string): string | null {
  const match = /^\/notices\/([^/]+)/.exec(pathname);
  return match ? decodeURIComponent(match[1]) : null;
}

const styles = StyleSheet.create({
  list: { gap: space.sm, paddingBottom: space.xl },
  items: { gap: space.sm },
  zone: { ...type.caption, color: colors.inkMuted },
});
