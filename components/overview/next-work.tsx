// A tenant user's coming work on its slices, in its notices' words; each row opens the notice.
import { Pressable, Text, View } from 'react-native';
import type { TenantWindowView } from '@/shared/tenant-windows';
import { formatWindowRange } from '@/components/time';
import { UpcomingPanel, upcomingStyles as styles } from '@/components/overview/upcoming-panel';
import { linkKeyProps } from '@/components/key-props';

export function NextWork({ work, onOpenNotice }: { work: readonly TenantWindowView[]; onOpenNotice: (noticeId: string) => void }) {
  return (
    <UpcomingPanel title="Planned work on your slices" emptyText="No planned work on your slices has been announced."
      count={work.length} testID="overview-next-work">
      {(timeZone) => (
        <View role="list" aria-label="Planned work on your slices">
          {work.map((item, index) => (
            // Each link is named by what it shows: the work, its times, its effect and stage.
            <View role="listitem" key={item.windowId}>
              <Pressable role="link" testID={`next-work-${item.windowId}`}
                onPress={() => onOpenNotice(item.noticeId)} {...linkKeyProps(() => onOpenNotice(item.noticeId))} style={[styles.row, index > 0 && styles.rowDivider]}>
                <View style={styles.rowMain}>
                  <Text style={styles.lead}>{item.summary}</Text>
                  <Text style={styles.when}>{formatWindowRange(item.startsAt, item.endsAt, timeZone)}</Text>
                  <Text style={styles.when}>{item.effectText}</Text>
                </View>
                <Text style={styles.stage}>{item.stage}</Text>
              </Pressable>
            </View>
          ))}
        </View>
      )}
    </UpcomingPanel>
  );
}
