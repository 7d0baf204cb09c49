// The overview screen's data view: figure tiles above the list of coming windows, in a readable column.
import { ScrollView, StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import { isTenantOverview, type AnyOverview } from '@/shared/tenant-windows';
import { FigureTiles } from '@/components/overview/figure-tiles';
import { NextWindows } from '@/components/overview/next-windows';
import { NextWork } from '@/components/overview/next-work';
import { WaitingDecisions } from '@/components/overview/waiting-decisions';
import { DemoDataNotice } from '@/components/demo-data/demo-data-notice';
import { colors, CONTENT_MAX_WIDTH_PX, space, type } from '@/constants/theme';

/** True when there is nothing to summarise yet (no network loaded); the screen then shows its empty state. */
export function isOverviewEmpty(overview: AnyOverview): boolean {
  const upcoming = isTenantOverview(overview) ? overview.nextWork : overview.nextWindows;
  return overview.sites === 0 && overview.slices === 0 && upcoming.length === 0;
}

/** A tenant user's overview lists its notified work, each row opening the notice (`onOpenNotice`). */
export function OverviewView({ overview, onOpenNotice }: { overview: AnyOverview; onOpenNotice: (noticeId: string) => void }) {
  const { width } = useWindowDimensions();
  const columns = width >= 1100 ? 3 : 2;
  return (
    // The page scrolls inside the shell, and its rows are not all Tab stops: a focusable, named region lets a
    // keyboard reach the scroll area and scroll it with the arrow keys.
    <ScrollView contentContainerStyle={styles.page} tabIndex={0} role="region" aria-label="Overview" testID="overview-scroll">
      <View style={styles.column}>
        <Text style={styles.title} role="heading" aria-level={1}>
          Overview
        </Text>
        <DemoDataNotice />
        <WaitingDecisions />
        <FigureTiles overview={overview} columns={columns} />
        {isTenantOverview(overview)
          ? <NextWork work={overview.nextWork} onOpenNotice={onOpenNotice} />
          : <NextWindows windows={overview.nextWindows} inHorizon={overview.windowsNext30Days} />}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  page: { padding: space.lg, alignItems: 'center' },
  column: { width: '100%', maxWidth: CONTENT_MAX_WIDTH_PX, gap: space.lg },
  title: { ...type.display, color: colors.abyss },
});
