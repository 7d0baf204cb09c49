// A finished search: the usable slots ranked best first, the caution where critical slices are touched, then the
// excluded slots folded away, grouped by reason. With no usable slot it says why and what to widen.
import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { SlotSearch } from '@/shared/slots';
import { CriticalCaution } from '@/components/critical-caution';
import { SEVERITY_SCALE } from '@/components/impact/impact-format';
import { formatWindowRange } from '@/components/time';
import { colors, radii, space, type } from '@/constants/theme';
import { SlotCandidateRow } from './slot-candidate';
import { excludedGroups, noSlotReason, rankedSlots, SLOT_RISK_MEANING, summaryText } from './slot-words';

type Props = { search: SlotSearch; timeZone: string; onBook: (rank: number) => void };

export function SlotResults({ search, timeZone, onBook }: Props) {
  const ranked = rankedSlots(search.candidates);
  const groups = excludedGroups(search.candidates);
  const excludedCount = groups.reduce((n, g) => n + g.slots.length, 0);
  const critical = ranked.some((c) => c.criticalTouched > 0);
  return (
    <View style={styles.stack} testID="slot-results">
      <Text style={styles.heading} role="heading" aria-level={2}>
        {ranked.length === 0 ? 'No usable slot' : `${ranked.length} usable ${ranked.length === 1 ? 'slot' : 'slots'}, best first`}
      </Text>
      {search.summary ? <Text style={styles.muted} testID="slot-summary">{summaryText(search.summary)}</Text> : null}
      {ranked.length === 0 ? (
        <View style={styles.empty} testID="slot-results-empty">
          <Text style={styles.body}>{noSlotReason(search.candidates)}</Text>
          <Text style={styles.body}>Try a wider range of nights, longer allowed hours or more nights of the week, or split the work into shorter slots.</Text>
        </View>
      ) : (
        <>
          <View style={styles.legend} testID="slot-risk-scale">
            <Text style={styles.muted}>{SLOT_RISK_MEANING}</Text>
            <Text style={styles.muted}>{SEVERITY_SCALE}</Text>
          </View>
          {critical ? (
            <CriticalCaution title="Critical slices in these slots" testID="slot-critical-caution"
              lead="Some slots touch slices that carry public-safety, health or utility services." />
          ) : null}
          <View style={styles.list} role="list" aria-label="Usable slots, best first">
            {ranked.map((c) => (
              <View key={c.start} role="listitem">
                <SlotCandidateRow candidate={c} timeZone={timeZone} onBook={() => onBook(c.rank ?? 0)} />
              </View>
            ))}
          </View>
        </>
      )}
      {excludedCount > 0 ? <ExcludedSlots groups={groups} count={excludedCount} timeZone={timeZone} /> : null}
    </View>
  );
}

function ExcludedSlots({ groups, count, timeZone }: { groups: ReturnType<typeof excludedGroups>; count: number; timeZone: string }) {
  const [open, setOpen] = useState(false);
  return (
    <View style={styles.excluded} testID="slot-excluded">
      <Pressable role="button" aria-expanded={open} onPress={() => setOpen((o) => !o)} style={styles.toggle} testID="slot-excluded-toggle">
        <Text style={styles.toggleText}>{open ? '▾' : '▸'} Excluded slots ({count})</Text>
      </Pressable>
      {open ? groups.map((group) => (
        <View key={group.code} style={styles.group} testID={`slot-excluded-${group.code}`}>
          <Text style={styles.groupTitle} role="heading" aria-level={3}>{group.label} ({group.slots.length})</Text>
          <View role="list" aria-label={group.label}>
            {group.slots.map((c) => (
              <View key={c.start} role="listitem" style={styles.excludedRow}>
                <Text style={styles.bodyStrong}>{formatWindowRange(c.start, c.end, timeZone)}</Text>
                <Text style={styles.body}>{c.excluded?.reason}</Text>
              </View>
            ))}
          </View>
        </View>
      )) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: space.md },
  heading: { ...type.title, color: colors.ink },
  list: { gap: space.md },
  legend: { gap: space.xxs },
  empty: { gap: space.sm, padding: space.lg, backgroundColor: colors.surface, borderRadius: radii.lg, borderWidth: 1, borderColor: colors.border },
  body: { ...type.body, color: colors.ink },
  bodyStrong: { ...type.bodyStrong, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
  excluded: { gap: space.sm, padding: space.md, backgroundColor: colors.surface, borderRadius: radii.lg, borderWidth: 1, borderColor: colors.border },
  toggle: { minHeight: 44, justifyContent: 'center' },
  toggleText: { ...type.heading, color: colors.primary },
  group: { gap: space.xs },
  groupTitle: { ...type.bodyStrong, color: colors.ink },
  excludedRow: { gap: space.xxs, paddingVertical: space.sm, borderTopWidth: 1, borderTopColor: colors.surfaceSunken },
});
