// Editing the times of a window whose tenants were already told them: say, before saving, what that sets off.
import { StyleSheet, Text, View } from 'react-native';
import type { WindowStatus } from '@/shared/windows';
import { tidyDateTime } from '@/components/windows/time-fields';
import { colors, radii, space, type } from '@/constants/theme';

export type WallTimes = { startDate: string; startTime: string; endDate: string; endTime: string };

/** States in which tenants have been told the times (cleared: their notices are going out or held for an admin). */
const TOLD_STATES: readonly WindowStatus[] = ['cleared', 'notified'];

export const tenantsWereTold = (status: WindowStatus) => TOLD_STATES.includes(status);

/** Whether the form's times differ from the stored ones (compared tidied, so "1:00" equals "01:00"). */
export function timesChanged(stored: WallTimes, now: WallTimes): boolean {
  const a = [tidyDateTime(stored.startDate, stored.startTime), tidyDateTime(stored.endDate, stored.endTime)];
  const b = [tidyDateTime(now.startDate, now.startTime), tidyDateTime(now.endDate, now.endTime)];
  return a.some((pair, i) => pair.date !== b[i].date || pair.time !== b[i].time);
}

export function TimeChangeWarning() {
  return (
    <View style={styles.box} role="alert" testID="window-time-change-warning">
      <Text style={styles.title}>Tenants were told the current times</Text>
      <Text style={styles.body}>
        Saving new times sends this window back to draft. Once it is cleared again, every affected tenant gets a
        changed notice with the new times and a calendar update.
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xs, padding: space.md, borderRadius: radii.md, backgroundColor: colors.surfaceSunken, borderLeftWidth: 4, borderLeftColor: colors.warning },
  title: { ...type.bodyStrong, color: colors.warning },
  body: { ...type.body, color: colors.ink },
});
