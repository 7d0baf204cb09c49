// One usable slot in the ranked list: its rank, its time (viewer's zone, UTC below), why it ranks there, the figures
// behind the ranking with their units, and the button that opens the booking form filled with it.
import { StyleSheet, Text, View } from 'react-native';
import type { SlotCandidate } from '@/shared/slots';
import { TOUCH_COUNT_WORDS } from '@/shared/touch-counts';
import { Button } from '@/components/button';
import { ZonedWhen } from '@/components/time/zoned-when';
import { colors, radii, space, type } from '@/constants/theme';
import { noticeText, riskText } from './slot-words';

type Props = { candidate: SlotCandidate; timeZone: string; onBook?: () => void };

const slices = (n: number) => `${n} ${n === 1 ? 'slice' : 'slices'}`;

/** The figures of a slot, each with its unit; "not checked" where the quick re-map did not run. */
export function candidateFigures(c: SlotCandidate): { key: string; label: string; value: string }[] {
  return [
    { key: 'touched', label: TOUCH_COUNT_WORDS.touched.label, value: slices(c.touched) },
    { key: 'unresolved', label: TOUCH_COUNT_WORDS.unresolved.label, value: c.unresolved === null ? 'not checked' : slices(c.unresolved) },
    { key: 'critical', label: 'Critical slices touched', value: slices(c.criticalTouched) },
    { key: 'risk', label: 'Risk of failure during the slot', value: riskText(c) },
    { key: 'notice', label: 'Tenant notice', value: noticeText(c.noticeSpareDays) },
    { key: 'overlap', label: 'Other windows at the same time', value: String(c.overlapping.length) },
  ];
}

export function SlotCandidateRow({ candidate: c, timeZone, onBook }: Props) {
  const rank = c.rank ?? 0;
  return (
    <View style={styles.card} testID={`slot-candidate-${rank}`}>
      <View style={styles.head}>
        <View style={styles.rank} aria-label={`Rank ${rank}`}>
          <Text style={styles.rankText}>{rank}</Text>
        </View>
        <View style={styles.when}>
          <ZonedWhen startsAt={c.start} endsAt={c.end} timeZone={timeZone} style={styles.time} testID={`slot-candidate-${rank}-when`} />
        </View>
      </View>
      <Text style={styles.body} testID={`slot-candidate-${rank}-explanation`}>{c.explanation}</Text>
      <View style={styles.figures} role="list" aria-label={`Figures for rank ${rank}`}>
        {candidateFigures(c).map((f) => (
          <View key={f.key} style={styles.figure} role="listitem" testID={`slot-candidate-${rank}-${f.key}`}>
            <Text style={styles.figureLabel}>{f.label}</Text>
            <Text style={styles.figureValue}>{f.value}</Text>
          </View>
        ))}
      </View>
      {onBook ? (
        <View style={styles.actions}>
          <Button label="Book this slot" onPress={onBook} testID={`slot-book-${rank}`} />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  card: { gap: space.sm, padding: space.lg, backgroundColor: colors.surface, borderRadius: radii.lg, borderWidth: 1, borderColor: colors.border },
  head: { flexDirection: 'row', gap: space.md, alignItems: 'flex-start' },
  rank: { width: 36, height: 36, borderRadius: radii.pill, backgroundColor: colors.primary, alignItems: 'center', justifyContent: 'center' },
  rankText: { ...type.heading, color: colors.onPrimary },
  when: { flex: 1 },
  time: { ...type.bodyStrong, color: colors.ink },
  body: { ...type.body, color: colors.ink },
  figures: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  figure: { flexBasis: 150, flexGrow: 1, gap: space.xxs },
  figureLabel: { ...type.caption, color: colors.inkMuted },
  figureValue: { ...type.bodyStrong, color: colors.ink },
  actions: { flexDirection: 'row' },
});
