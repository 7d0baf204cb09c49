// Per affected slice: what the plan does with it, and before → after for every moved function and rerouted tie.
import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { PlanSlice, SliceOutcome } from '@/shared/plans';
import { OUTCOME_LABELS } from '@/components/plans/plan-format';
import type { ElementNames } from '@/components/plans/use-element-names';
import { calendarColors, colors, radii, space, type } from '@/constants/theme';

type Props = { slices: readonly PlanSlice[]; names: ElementNames; selected: string | null; onSelect: (slice: string | null) => void };

const OUTCOME_TONES: Record<SliceOutcome, { color: string; backgroundColor: string }> = {
  stays: { color: colors.inkMuted, backgroundColor: colors.surfaceSunken },
  reroute: { color: colors.primary, backgroundColor: colors.primarySoft },
  move: { color: colors.onPrimary, backgroundColor: calendarColors.status.planned },
  unresolved: { color: colors.onPrimary, backgroundColor: colors.danger },
};

const ORDER: Record<SliceOutcome, number> = { unresolved: 0, move: 1, reroute: 2, stays: 3 };

export function OutcomePill({ outcome, testID }: { outcome: SliceOutcome; testID?: string }) {
  return <Text style={[styles.pill, OUTCOME_TONES[outcome]]} testID={testID}>{OUTCOME_LABELS[outcome]}</Text>;
}

function SliceCard({ slice, names, selected, onSelect }: { slice: PlanSlice; names: ElementNames; selected: boolean; onSelect: () => void }) {
  return (
    <Pressable
      onPress={onSelect}
      role="button"
      aria-pressed={selected}
      accessibilityLabel={`${slice.name}: ${OUTCOME_LABELS[slice.outcome]}${selected ? ' (shown on the map)' : ''}`}
      style={[styles.card, selected && styles.selected]}
      testID={`plan-slice-${slice.slice}`}
    >
      <View style={styles.head}>
        <Text style={styles.name}>{slice.name}</Text>
        <OutcomePill outcome={slice.outcome} testID={`plan-slice-outcome-${slice.slice}`} />
        {slice.critical ? <Text style={styles.critical}>Critical</Text> : null}
      </View>
      <Text style={styles.muted}>{slice.slice} · priority {slice.priority}{slice.reasons.length ? ` · ${slice.reasons.join(', ')}` : ''}</Text>
      {slice.moves.map((m) => (
        <Text key={m.function} style={styles.body} testID={`plan-move-${m.function}`}>
          {m.function}: {names.site(m.from)} ({m.from}) → {names.site(m.to)} ({m.to})
        </Text>
      ))}
      {slice.reroutes.map((r) => (
        <View key={r.tie} testID={`plan-reroute-${r.tie}`}>
          <Text style={styles.body}>{r.tie}: {names.path(r.from)}</Text>
          <Text style={styles.body}>  → {names.path(r.to)}</Text>
          <Text style={styles.muted}>spans {r.from.join(', ') || 'none'} → {r.to.join(', ') || 'none'}</Text>
        </View>
      ))}
      {slice.outcome === 'stays' ? <Text style={styles.muted}>Keeps its current placement.</Text> : null}
      {slice.unresolvedReason ? <Text style={styles.error}>Why: {slice.unresolvedReason}</Text> : null}
    </Pressable>
  );
}

export function PlanSliceOutcomes({ slices, names, selected, onSelect }: Props) {
  const sorted = [...slices].sort((a, b) => ORDER[a.outcome] - ORDER[b.outcome] || Number(b.critical) - Number(a.critical) || a.name.localeCompare(b.name));
  return (
    <View style={styles.list} testID="plan-slices">
      <Text style={styles.muted}>Tap a slice to show only its paths on the map; tap it again to show every change.</Text>
      {sorted.map((slice) => (
        <SliceCard
          key={slice.slice}
          slice={slice}
          names={names}
          selected={selected === slice.slice}
          onSelect={() => onSelect(selected === slice.slice ? null : slice.slice)}
        />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  card: { gap: space.xs, padding: space.md, borderRadius: radii.md, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surface },
  selected: { borderColor: colors.primary, borderWidth: 2 },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  name: { ...type.bodyStrong, color: colors.ink },
  pill: { ...type.label, paddingHorizontal: space.sm, paddingVertical: space.xxs, borderRadius: radii.pill, overflow: 'hidden' },
  critical: { ...type.label, color: calendarColors.critical },
  body: { ...type.body, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
  error: { ...type.body, color: colors.danger },
});
