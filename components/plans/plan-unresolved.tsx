// Slices the plan cannot place: why, and the three ways on — accept the outage, move the window, or add capacity.
import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { PlanSlice } from '@/shared/plans';
import { Button } from '@/components/button';
import { spaceActivates } from '@/components/roving-focus';
import { calendarColors, colors, radii, space, type } from '@/constants/theme';

type Props = {
  slices: readonly PlanSlice[];
  ticked: readonly string[];
  /** ticking is only offered to those who may accept */
  canTick: boolean;
  onToggle: (slice: string) => void;
  onReschedule: () => void;
  onAddCapacity: (where: 'imports' | 'network') => void;
};

function Tick({ slice, on, onToggle }: { slice: PlanSlice; on: boolean; onToggle: () => void }) {
  return (
    <Pressable
      role="checkbox"
      aria-checked={on}
      onPress={onToggle}
      {...spaceActivates(onToggle)}
      style={styles.tick}
      testID={`plan-outage-${slice.slice}`}
    >
      <View style={[styles.box, on && styles.boxOn]}>{on ? <Text style={styles.check}>✓</Text> : null}</View>
      <Text style={styles.body}>Accept the outage: {slice.name} is down for the window</Text>
    </Pressable>
  );
}

export function PlanUnresolved({ slices, ticked, canTick, onToggle, onReschedule, onAddCapacity }: Props) {
  return (
    <View style={styles.panel} testID="plan-unresolved">
      <Text style={styles.heading}>{slices.length} {slices.length === 1 ? 'slice has' : 'slices have'} no place to go</Text>
      {slices.map((slice) => (
        <View key={slice.slice} style={styles.slice} testID={`plan-unresolved-${slice.slice}`}>
          <Text style={styles.name}>{slice.name}{slice.critical ? ' · critical' : ''}</Text>
          <Text style={styles.reason}>{slice.unresolvedReason ?? 'No feasible placement was found.'}</Text>
          {canTick ? <Tick slice={slice} on={ticked.includes(slice.slice)} onToggle={() => onToggle(slice.slice)} /> : null}
        </View>
      ))}
      <Text style={styles.body}>Or change the circumstances and run again:</Text>
      <View style={styles.actions}>
        <Button label="Reschedule the window" variant="quiet" onPress={onReschedule} testID="plan-choice-reschedule" />
        <Button label="Add capacity (import)" variant="quiet" onPress={() => onAddCapacity('imports')} testID="plan-choice-capacity" />
        <Button label="See the network" variant="quiet" onPress={() => onAddCapacity('network')} testID="plan-choice-network" />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { gap: space.sm, padding: space.lg, borderRadius: radii.lg, borderWidth: 2, borderColor: colors.danger, backgroundColor: colors.dangerSoft },
  heading: { ...type.heading, color: colors.danger },
  slice: { gap: space.xs, paddingVertical: space.sm, borderTopWidth: 1, borderTopColor: colors.border },
  name: { ...type.bodyStrong, color: colors.ink },
  reason: { ...type.body, color: colors.ink },
  tick: { flexDirection: 'row', alignItems: 'center', gap: space.sm, minHeight: 40 },
  box: {
    width: 22, height: 22, borderRadius: radii.sm, borderWidth: 2, borderColor: calendarColors.critical,
    backgroundColor: colors.surface, alignItems: 'center', justifyContent: 'center',
  },
  boxOn: { backgroundColor: calendarColors.critical },
  check: { ...type.label, color: colors.onPrimary },
  body: { ...type.body, color: colors.ink, flexShrink: 1 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
