// The selected day's agenda: its freezes, then every window touching the day, times in the viewer's zone.
import type { Href } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';
import { calendarColors, colors, radii, space, type } from '@/constants/theme';
import { formatWindowRange, startOfDayMs } from '@/components/time';
import type { CalendarFreeze, CalendarWindow } from './calendar-types';
import { AgendaRow, type ElementNamer } from './agenda-row';

type Props = {
  day: string;
  timeZone: string;
  windows: readonly CalendarWindow[];
  freezes: readonly CalendarFreeze[];
  onOpenWindow?: (id: string) => void;
  /** where a window's row leads (its page, or a tenant's notice), making the row a real link */
  windowHref?: (id: string) => Href | null;
  /** names the windows' sites and spans (the ids show without it) */
  elementName?: ElementNamer;
  /** what to say when the day has no windows (filters may be hiding some) */
  emptyHint?: string;
};

function dayHeading(day: string, timeZone: string): string {
  return new Intl.DateTimeFormat('en-GB', { weekday: 'long', day: 'numeric', month: 'long', year: 'numeric', timeZone }).format(
    new Date(startOfDayMs(day, timeZone)),
  ).replace(',', '');
}

export function AgendaList({ day, timeZone, windows, freezes, onOpenWindow, windowHref, elementName, emptyHint }: Props) {
  return (
    <View style={styles.panel} testID="calendar-agenda">
      <View style={styles.header}>
        <Text style={styles.heading} role="heading" testID="calendar-agenda-day">
          {dayHeading(day, timeZone)}
        </Text>
      </View>
      {freezes.map((freeze) => (
        <View key={freeze.id} style={styles.freeze} testID={`agenda-freeze-${freeze.id}`}>
          <Text style={styles.freezeTitle}>Freeze: {freeze.title}</Text>
          <Text style={styles.freezeWhen}>{formatWindowRange(freeze.startsAt, freeze.endsAt, timeZone)}</Text>
          <Text style={styles.freezeWhen}>No windows may be booked in this period without an admin's written override.</Text>
        </View>
      ))}
      {windows.length === 0 ? (
        <View style={styles.empty} testID="calendar-agenda-empty">
          <Text style={styles.emptyTitle}>No windows on this day</Text>
          {emptyHint ? <Text style={styles.emptyHint}>{emptyHint}</Text> : null}
        </View>
      ) : (
        windows.map((window, index) => (
          <View key={window.id} style={index > 0 && styles.divider}>
            <AgendaRow window={window} timeZone={timeZone} onOpen={onOpenWindow} href={windowHref?.(window.id)} elementName={elementName} />
          </View>
        ))
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { backgroundColor: colors.surface, borderRadius: radii.lg, borderWidth: 1, borderColor: colors.border, padding: space.lg, gap: space.xs },
  header: { gap: space.xxs, marginBottom: space.sm },
  heading: { ...type.heading, color: colors.ink },
  freeze: {
    backgroundColor: calendarColors.freezeWash,
    borderLeftWidth: 4,
    borderLeftColor: calendarColors.freezeHatch,
    borderRadius: radii.md,
    padding: space.md,
    gap: space.xxs,
    marginBottom: space.sm,
  },
  freezeTitle: { ...type.bodyStrong, color: calendarColors.freezeInk },
  freezeWhen: { ...type.caption, color: calendarColors.freezeInk },
  empty: { paddingVertical: space.xl, alignItems: 'center', gap: space.xs },
  emptyTitle: { ...type.bodyStrong, color: colors.inkMuted },
  emptyHint: { ...type.caption, color: colors.inkMuted, textAlign: 'center' },
  divider: { borderTopWidth: 1, borderTopColor: colors.surfaceSunken },
});
