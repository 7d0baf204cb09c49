// The next maintenance windows, times shown in the viewer's zone with the zone named in the heading; each row is
// a link to the window.
import { Link } from 'expo-router';
import { Pressable, Text, View } from 'react-native';
import { STATUS_LABELS } from '@/components/windows/lifecycle';
import { nextWindowsCaption } from '@/components/overview/next-windows-caption';
import type { Overview } from '@/shared/api';
import { formatWindowRange } from '@/components/time';
import { UpcomingPanel, upcomingStyles as styles } from '@/components/overview/upcoming-panel';

type Props = { windows: Overview['nextWindows']; inHorizon: number; now?: Date };

/** The rows say which of them fall in the figure tiles' 30 days, so the count beside them matches what is listed. */
export function NextWindows({ windows, inHorizon, now = new Date() }: Props) {
  return (
    <UpcomingPanel title="Next windows" emptyText="No maintenance windows booked yet." count={windows.length}
      testID="overview-next-windows">
      {(timeZone) => [
        <Text key="caption" style={styles.when} testID="overview-next-windows-caption">
          {nextWindowsCaption(windows, inHorizon, now)}
        </Text>,
        <View key="list" role="list" aria-label="Next windows" testID="overview-next-windows-list">
          {windows.map((window, index) => (
            <View key={window.id} role="listitem">
              <Link href={{ pathname: '/windows/[id]', params: { id: window.id } }} asChild>
                <Pressable role="link" testID={`next-window-${window.id}`}>
                  {/* Layout on an inner View: Link's asChild merge hands a style array to the DOM unflattened. */}
                  <View style={[styles.row, index > 0 && styles.rowDivider]}>
                    <View style={styles.rowMain}>
                      <Text style={styles.lead}>{window.title}</Text>
                      <Text style={styles.when}>{formatWindowRange(window.startsAt, window.endsAt, timeZone)}</Text>
                    </View>
                    <Text style={styles.stage}>{STATUS_LABELS[window.status as keyof typeof STATUS_LABELS] ?? window.status}</Text>
                  </View>
                </Pressable>
              </Link>
            </View>
          ))}
        </View>,
      ]}
    </UpcomingPanel>
  );
}
