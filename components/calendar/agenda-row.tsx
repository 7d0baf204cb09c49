// One window in the day's agenda: status tone, title, its time in the viewer's zone, elements and badges.
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, radii, space, type } from '@/constants/theme';
import { formatDuration, formatWindowRange } from '@/components/time';
import type { CalendarWindow } from './calendar-types';
import { statusColor } from './calendar-marks';
import { WindowBadges } from './window-badges';

type Props = { window: CalendarWindow; timeZone: string; onOpen: (id: string) => void };

const MAX_ELEMENTS_SHOWN = 3;

function elementSummary(window: CalendarWindow): string {
  const ids = window.elements.map((e) => (e.effect === 'reduced' ? `${e.id} (reduced)` : e.id));
  if (ids.length === 0) return 'No elements yet';
  const shown = ids.slice(0, MAX_ELEMENTS_SHOWN).join(', ');
  return ids.length > MAX_ELEMENTS_SHOWN ? `${shown} +${ids.length - MAX_ELEMENTS_SHOWN}` : shown;
}

export function AgendaRow({ window, timeZone, onOpen }: Props) {
  const tone = statusColor(window.status);
  const durationMs = Date.parse(window.endsAt) - Date.parse(window.startsAt);
  return (
    <Pressable
      role="link"
      testID={`agenda-window-${window.id}`}
      accessibilityLabel={`${window.title}, ${window.statusLabel ?? window.status}`}
      onPress={() => onOpen(window.id)}
      style={({ pressed }) => [styles.row, pressed && styles.pressed]}
    >
      <View style={[styles.stripe, { backgroundColor: tone }]} />
      <View style={styles.main}>
        <View style={styles.titleLine}>
          <Text style={styles.title} numberOfLines={2}>
            {window.title}
          </Text>
          <Text style={[styles.status, { borderColor: tone, color: colors.ink }]}>{window.statusLabel ?? window.status}</Text>
        </View>
        <Text style={styles.when} testID={`agenda-window-${window.id}-when`}>
          {formatWindowRange(window.startsAt, window.endsAt, timeZone)} · {formatDuration(durationMs)}
        </Text>
        <Text style={styles.elements} numberOfLines={1}>
          {window.detail ?? `${window.workType ? `${window.workType} · ` : ''}${elementSummary(window)}`}
        </Text>
        <WindowBadges window={window} />
      </View>
      <Text style={styles.chevron}>›</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  row: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
    paddingVertical: space.md,
    paddingRight: space.md,
    borderRadius: radii.md,
  },
  pressed: { backgroundColor: colors.primarySoft },
  stripe: { width: 5, alignSelf: 'stretch', borderRadius: radii.sm },
  main: { flex: 1, gap: space.xs },
  titleLine: { flexDirection: 'row', alignItems: 'flex-start', gap: space.sm },
  title: { ...type.bodyStrong, color: colors.ink, flex: 1 },
  status: {
    ...type.caption,
    borderWidth: 1.5,
    borderRadius: radii.pill,
    paddingHorizontal: space.sm,
    paddingVertical: 1,
  },
  when: { ...type.body, fontSize: 14, color: colors.ink },
  elements: { ...type.caption, color: colors.inkMuted },
  chevron: { fontSize: 22, color: colors.inkFaint },
});
