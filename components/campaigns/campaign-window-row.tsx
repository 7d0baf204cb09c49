// One window of a draft campaign: its time, group, cost and explanation, and moving it to another of its group's
// usable starts (the alternatives the scheduler kept), one tap each.
import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { CampaignWindow } from '@/shared/slots';
import { formatWindowRange } from '@/components/time';
import { ZonedWhen } from '@/components/time/zoned-when';
import { colors, radii, space, type } from '@/constants/theme';
import { formatPoints } from './campaign-words';

type Props = {
  window: CampaignWindow;
  timeZone: string;
  /** unset when the draft cannot be changed (booked, or the viewer may only read) */
  onMove?: (group: number, start: string) => void;
  moving: boolean;
};

/** How many alternatives one window lists; the cheapest come first, so the rest are seldom wanted. */
const ALTERNATIVES_SHOWN = 12;

export function CampaignWindowRow({ window: w, timeZone, onMove, moving }: Props) {
  const [open, setOpen] = useState(false);
  const names = w.elements.map((e) => e.name).join(', ');
  const alternatives = w.alternatives.filter((a) => a.start !== w.start).slice(0, ALTERNATIVES_SHOWN);
  return (
    <View style={styles.row} testID={`campaign-window-${w.group}`}>
      <Text style={styles.label}>{w.label}</Text>
      <ZonedWhen startsAt={w.start} endsAt={w.end} timeZone={timeZone} style={styles.when} testID={`campaign-window-${w.group}-when`} />
      {names ? <Text style={styles.muted}>{names}</Text> : null}
      <Text style={styles.body}>{w.explanation}</Text>
      <Text style={styles.muted} testID={`campaign-window-${w.group}-cost`}>
        Cost {formatPoints(w.cost)} · {w.touched} touched {w.touched === 1 ? 'slice' : 'slices'}
        {w.unresolved === null ? '' : ` · ${w.unresolved} cannot be kept`}
      </Text>
      {onMove ? (
        <Pressable role="button" aria-expanded={open} disabled={moving || alternatives.length === 0} onPress={() => setOpen((o) => !o)}
          style={styles.moveToggle} testID={`campaign-move-${w.group}`}>
          <Text style={[styles.moveText, alternatives.length === 0 && styles.muted]}>
            {alternatives.length === 0 ? 'No other start keeps this group usable' : open ? 'Keep this time' : 'Move to another night or time'}
          </Text>
        </Pressable>
      ) : null}
      {open && onMove ? (
        <View role="list" aria-label={`Other starts for ${w.label}`} style={styles.alternatives} testID={`campaign-move-${w.group}-choices`}>
          {alternatives.map((a, i) => (
            <View key={a.start} role="listitem">
              <Pressable role="button" disabled={moving} onPress={() => { setOpen(false); onMove(w.group, a.start); }}
                style={({ pressed }) => [styles.choice, pressed && styles.pressed]} testID={`campaign-move-${w.group}-to-${i}`}
                accessibilityLabel={`Move ${w.label} to ${formatWindowRange(a.start, a.end, timeZone)}, cost ${formatPoints(a.cost)}`}>
                <Text style={styles.body}>{formatWindowRange(a.start, a.end, timeZone)}</Text>
                <Text style={styles.muted}>Cost {formatPoints(a.cost)}</Text>
              </Pressable>
            </View>
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { gap: space.xs, paddingVertical: space.md, borderTopWidth: 1, borderTopColor: colors.surfaceSunken },
  label: { ...type.heading, color: colors.ink },
  when: { ...type.bodyStrong, color: colors.ink },
  body: { ...type.body, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
  moveToggle: { minHeight: 44, justifyContent: 'center', alignSelf: 'flex-start' },
  moveText: { ...type.label, color: colors.primary },
  alternatives: { gap: space.xs },
  choice: { minHeight: 44, padding: space.sm, borderRadius: radii.md, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surface },
  pressed: { backgroundColor: colors.primarySoft },
});
