// A scheduled campaign: its windows night by night, the groups left unscheduled and why, the total cost beside the
// first schedule found, and the planner's actions (move a window, book all windows or none, discard the draft).
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { Campaign } from '@/shared/slots';
import { Button } from '@/components/button';
import { CriticalCaution } from '@/components/critical-caution';
import { ZoneNote } from '@/components/time/zoned-when';
import { colors, radii, space, type } from '@/constants/theme';
import { CampaignWindowRow } from './campaign-window-row';
import { formatPoints, gainText, nightLabel, refusalLines, windowsByNight } from './campaign-words';

type Props = {
  campaign: Campaign;
  timeZone: string;
  /** false for a reader (admin): the draft shows, its actions do not */
  canEdit: boolean;
  onMove: (group: number, start: string) => void;
  onBook: () => void;
  onDiscard: () => void;
  onShowCalendar: () => void;
  busy: 'move' | 'book' | 'discard' | null;
  /** the last refused move, booking or discard */
  error: unknown;
};

export function CampaignDraft({ campaign: c, timeZone, canEdit, onMove, onBook, onDiscard, onShowCalendar, busy, error }: Props) {
  const [confirm, setConfirm] = useState<'book' | 'discard' | null>(null);
  const editable = canEdit && c.status === 'draft';
  const count = c.windows.length;
  const gain = gainText(c);
  const refusal = refusalLines(error);
  return (
    <View style={styles.stack} testID="campaign-draft">
      <View style={styles.totals} testID="campaign-totals">
        <Text style={styles.total}>Total cost {formatPoints(c.totalCost)} for {count} {count === 1 ? 'window' : 'windows'}</Text>
        {gain ? <Text style={styles.muted}>{gain}</Text> : null}
        <Text style={styles.muted}>Costs are the slot finder’s ranking points: lower hurts less.</Text>
      </View>
      {c.windows.some((w) => w.criticalTouched > 0) ? (
        <CriticalCaution title="Critical slices in this campaign" testID="campaign-critical-caution"
          lead="Some of its windows touch slices that carry public-safety, health or utility services." />
      ) : null}
      <ZoneNote timeZone={timeZone} testID="campaign-zone-note" />
      {refusal.length > 0 ? (
        <View style={styles.refusal} role="alert" testID="campaign-error">
          <Text style={styles.refusalTitle}>{refusal.length === 1 ? 'Not changed:' : `Not changed; ${refusal.length} rules would be broken:`}</Text>
          {refusal.map((line) => <Text key={line} style={styles.body}>• {line}</Text>)}
        </View>
      ) : null}
      {windowsByNight(c.windows).map(({ night, windows }) => (
        <View key={night} style={styles.night} testID={`campaign-night-${night}`}>
          <Text style={styles.nightTitle} role="heading" aria-level={2}>Night of {nightLabel(night)}</Text>
          {windows.map((w) => (
            <CampaignWindowRow key={w.group} window={w} timeZone={timeZone} onMove={editable ? onMove : undefined} moving={busy !== null} />
          ))}
        </View>
      ))}
      {c.unscheduled.length > 0 ? (
        <View style={styles.night} testID="campaign-unscheduled">
          <Text style={styles.nightTitle} role="heading" aria-level={2}>Not scheduled ({c.unscheduled.length})</Text>
          {c.unscheduled.map((u) => (
            <View key={u.group} style={styles.unscheduled} testID={`campaign-unscheduled-${u.group}`}>
              <Text style={styles.bodyStrong}>{u.label}</Text>
              <Text style={styles.body}>{u.reason}</Text>
            </View>
          ))}
        </View>
      ) : null}
      <View style={styles.actions}>
        <Button label="Show on calendar" variant="quiet" onPress={onShowCalendar} testID="campaign-show-calendar" />
      </View>
      {editable ? (
        <View style={styles.actionBox}>
          {confirm === 'book' ? (
            <View style={styles.confirm} testID="campaign-book-confirmation">
              <Text style={styles.bodyStrong}>Book all {count} {count === 1 ? 'window' : 'windows'} now?</Text>
              <Text style={styles.body}>
                They are booked together: if any one is refused (a freeze, a new conflict, a changed draft), none is booked and this draft stays as it is.
                {c.unscheduled.length > 0 ? ` The ${c.unscheduled.length} unscheduled ${c.unscheduled.length === 1 ? 'group is' : 'groups are'} not booked.` : ''}
              </Text>
              <View style={styles.actions}>
                <Button label={`Book all ${count}`} onPress={() => { setConfirm(null); onBook(); }} testID="campaign-book-confirm" />
                <Button label="Not now" variant="quiet" onPress={() => setConfirm(null)} testID="campaign-book-cancel" />
              </View>
            </View>
          ) : null}
          {confirm === 'discard' ? (
            <View style={styles.confirm} testID="campaign-discard-confirmation">
              <Text style={styles.bodyStrong}>Discard this draft?</Text>
              <Text style={styles.body}>Nothing is booked; the draft leaves the calendar and cannot be opened again for changes.</Text>
              <View style={styles.actions}>
                <Button label="Discard draft" onPress={() => { setConfirm(null); onDiscard(); }} testID="campaign-discard-confirm" />
                <Button label="Keep it" variant="quiet" onPress={() => setConfirm(null)} testID="campaign-discard-cancel" />
              </View>
            </View>
          ) : null}
          {confirm === null ? (
            <View style={styles.actions}>
              <Button label={`Book all ${count} windows`} onPress={() => setConfirm('book')} busy={busy === 'book'} disabled={count === 0 || busy !== null} testID="campaign-book" />
              <Button label="Discard draft" variant="quiet" onPress={() => setConfirm('discard')} busy={busy === 'discard'} disabled={busy !== null} testID="campaign-discard" />
            </View>
          ) : null}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: space.md },
  totals: { gap: space.xxs, padding: space.md, borderRadius: radii.md, backgroundColor: colors.surfaceSunken },
  total: { ...type.heading, color: colors.ink },
  night: { padding: space.lg, paddingBottom: space.sm, borderRadius: radii.lg, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surface },
  nightTitle: { ...type.heading, color: colors.ink, marginBottom: space.xs },
  unscheduled: { gap: space.xxs, paddingVertical: space.sm, borderTopWidth: 1, borderTopColor: colors.surfaceSunken },
  body: { ...type.body, color: colors.ink },
  bodyStrong: { ...type.bodyStrong, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
  refusal: { gap: space.xs, padding: space.md, borderRadius: radii.md, backgroundColor: colors.dangerSoft, borderLeftWidth: 4, borderLeftColor: colors.danger },
  refusalTitle: { ...type.bodyStrong, color: colors.danger },
  actionBox: { gap: space.md },
  confirm: { gap: space.sm, padding: space.md, borderRadius: radii.md, borderWidth: 2, borderColor: colors.primary, backgroundColor: colors.surface },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
