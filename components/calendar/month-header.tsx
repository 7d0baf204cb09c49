// Month title with previous / next and a "Today" jump; our own header so it reads and sounds the same everywhere.
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, radii, space, type } from '@/constants/theme';

type Props = { month: string; onPrevious: () => void; onNext: () => void; onToday: () => void; loading?: boolean };

export function monthTitle(month: string): string {
  const [year, monthNumber] = month.split('-').map(Number);
  // Noon UTC on the 1st is inside the month in every zone, so the title never slips a month.
  return new Intl.DateTimeFormat('en-GB', { month: 'long', year: 'numeric', timeZone: 'UTC' }).format(
    new Date(Date.UTC(year, monthNumber - 1, 1, 12)),
  );
}

function ArrowButton({ label, glyph, onPress, testID }: { label: string; glyph: string; onPress: () => void; testID: string }) {
  return (
    <Pressable
      role="button"
      accessibilityLabel={label}
      testID={testID}
      onPress={onPress}
      style={({ pressed }) => [styles.arrow, pressed && styles.pressed]}
    >
      <Text style={styles.arrowGlyph}>{glyph}</Text>
    </Pressable>
  );
}

export function MonthHeader({ month, onPrevious, onNext, onToday, loading = false }: Props) {
  return (
    <View style={styles.row}>
      <Text style={styles.title} role="heading" testID="calendar-month-title">
        {monthTitle(month)}
      </Text>
      {loading ? <Text style={styles.loading}>Loading…</Text> : null}
      <View style={styles.actions}>
        <Pressable role="button" testID="calendar-today" onPress={onToday} style={({ pressed }) => [styles.today, pressed && styles.pressed]}>
          <Text style={styles.todayText}>Today</Text>
        </Pressable>
        <ArrowButton label="Previous month" glyph="‹" onPress={onPrevious} testID="calendar-previous-month" />
        <ArrowButton label="Next month" glyph="›" onPress={onNext} testID="calendar-next-month" />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm, paddingHorizontal: space.md, paddingVertical: space.sm },
  title: { ...type.title, color: colors.ink },
  loading: { ...type.caption, color: colors.inkMuted },
  actions: { flexDirection: 'row', alignItems: 'center', gap: space.xs, marginLeft: 'auto' },
  arrow: { width: 36, height: 36, borderRadius: radii.pill, alignItems: 'center', justifyContent: 'center' },
  arrowGlyph: { fontSize: 26, lineHeight: 28, color: colors.primary },
  today: { paddingHorizontal: space.md, height: 32, justifyContent: 'center', borderRadius: radii.pill, borderWidth: 1, borderColor: colors.border },
  todayText: { ...type.label, color: colors.primary },
  pressed: { backgroundColor: colors.primarySoft },
});
