// Per slice of the plan: what it does with it, and before → after for every moved function and rerouted tie.
// Knock-on moves (slices the work does not touch, moved to make room) form their own group, each saying for whom.
import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { PlanSlice, SliceOutcome } from '@/shared/plans';
import { REASON_LABELS } from '@/components/impact/impact-format';
import { madeRoomSentence, OUTCOME_LABELS } from '@/components/plans/plan-format';
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

const capitalise = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);

/** "hosted, transit" in the impact screen's words. */
function reasonWords(reasons: readonly string[]): string {
  return reasons.map((r) => REASON_LABELS[r as keyof typeof REASON_LABELS]?.toLowerCase() ?? r).join(', ');
}

export const isKnockOn = (slice: Pick<PlanSlice, 'madeRoomFor'>) => slice.madeRoomFor.length > 0;

/** "Moved to make room for Harbour cranes" for a knock-on move; null for the window's own affected slices. */
export function knockOnReason(slice: Pick<PlanSlice, 'madeRoomFor' | 'outcome'>): string | null {
  return isKnockOn(slice) ? madeRoomSentence(slice.outcome, slice.madeRoomFor.map((m) => m.name)) : null;
}

function SliceCard({ slice, names, selected, onSelect }: { slice: PlanSlice; names: ElementNames; selected: boolean; onSelect: () => void }) {
  const reason = knockOnReason(slice);
  return (
    <Pressable
      onPress={onSelect}
      role="button"
      aria-pressed={selected}
      style={[styles.card, selected && styles.selected]}
      testID={`plan-slice-${slice.slice}`}
    >
      <View style={styles.head}>
        <Text style={styles.name}>{slice.name}</Text>
        <OutcomePill outcome={slice.outcome} testID={`plan-slice-outcome-${slice.slice}`} />
        {reason ? <Text style={styles.tag}>Knock-on move</Text> : null}
        {slice.critical ? <Text style={styles.critical}>Critical</Text> : null}
      </View>
      {reason ? <Text style={styles.reason} testID={`plan-slice-knock-on-${slice.slice}`}>{reason}</Text> : null}
      <Text style={styles.muted}>Priority {slice.priority}{slice.reasons.length ? ` · ${reasonWords(slice.reasons)}` : ''}</Text>
      {slice.moves.map((m) => (
        <Text key={m.function} style={styles.body} testID={`plan-move-${m.function}`}>
          {names.fn(m.function)}: from {names.site(m.from)} to {names.site(m.to)}
        </Text>
      ))}
      {slice.reroutes.map((r) => (
        <View key={r.tie} testID={`plan-reroute-${r.tie}`}>
          <Text style={styles.body}>{capitalise(names.tie(r.tie))}: from {names.path(r.from)}</Text>
          <Text style={styles.body}>  to {names.path(r.to)}</Text>
        </View>
      ))}
      {slice.outcome === 'stays' ? <Text style={styles.muted}>Keeps its current placement.</Text> : null}
      {slice.unresolvedReason ? <Text style={styles.error}>Why: {slice.unresolvedReason}</Text> : null}
    </Pressable>
  );
}

export function PlanSliceOutcomes({ slices, names, selected, onSelect }: Props) {
  const sorted = [...slices].sort((a, b) => ORDER[a.outcome] - ORDER[b.outcome] || Number(b.critical) - Number(a.critical) || a.name.localeCompare(b.name));
  const knockOn = sorted.filter(isKnockOn);
  const card = (slice: PlanSlice) => (
    <SliceCard
      key={slice.slice}
      slice={slice}
      names={names}
      selected={selected === slice.slice}
      onSelect={() => onSelect(selected === slice.slice ? null : slice.slice)}
    />
  );
  return (
    <View style={styles.list} testID="plan-slices">
      <Text style={styles.muted}>Tap a slice to show only its paths on the map; tap it again to show every change.</Text>
      {sorted.filter((s) => !isKnockOn(s)).map(card)}
      {knockOn.length > 0 ? (
        <View style={styles.list} testID="plan-knock-on-group">
          <Text style={styles.group}>Moved to make room ({knockOn.length})</Text>
          <Text style={styles.muted}>
            The work does not touch these slices. The plan moves them so that affected slices keep running; each move is
            paid at its move cost, and its tenant is told.
          </Text>
          {knockOn.map(card)}
        </View>
      ) : null}
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
  tag: {
    ...type.label, color: colors.ink, borderColor: colors.buoy, borderWidth: 1, paddingHorizontal: space.sm,
    paddingVertical: space.xxs, borderRadius: radii.pill, overflow: 'hidden',
  },
  reason: { ...type.bodyStrong, color: colors.ink },
  group: { ...type.heading, color: colors.ink, marginTop: space.sm },
  body: { ...type.body, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
  error: { ...type.body, color: colors.danger },
});
