// A notice as its tenant reads it: what, when (the reader's own zone and UTC), effect, each slice's moves, contact,
// the acknowledgement, and the invitation to add to a calendar again.
import { Linking, StyleSheet, Text, View } from 'react-native';
import type { Notice } from '@/shared/notices';
import { Button } from '@/components/button';
import { CriticalCaution } from '@/components/critical-caution';
import { Badge } from '@/components/inventory/badges';
import { DetailFrame, Note, Section } from '@/components/inventory/detail-frame';
import { describeZone, formatInstant, formatUtcRange, formatWindowRange } from '@/components/time';
import { useViewerTimeZone } from '@/components/time/use-viewer-time-zone';
import { colors, radii, space, type } from '@/constants/theme';
import { canAcknowledge, EFFECT_LABEL } from './notice-format';
import { NoticeSliceCard } from './notice-slice-card';

type Props = {
  notice: Notice;
  icsHref: string;
  onAcknowledge: () => void;
  acknowledging: boolean;
  error: string | null;
};

function Acknowledgement({ notice, onAcknowledge, acknowledging, error, timeZone }: Omit<Props, 'icsHref'> & { timeZone: string }) {
  if (notice.content.cancelled) return <Note>This work was withdrawn; there is nothing to acknowledge.</Note>;
  if (notice.acknowledgedAt) {
    const who = notice.acknowledgedByName ? ` by ${notice.acknowledgedByName}` : '';
    return <Text style={styles.acked} testID="notice-acknowledged">{`Acknowledged${who} on ${formatInstant(notice.acknowledgedAt, timeZone)}`}</Text>;
  }
  return (
    <View style={styles.ackBox}>
      <Button label="Acknowledge this notice" onPress={onAcknowledge} busy={acknowledging} disabled={!canAcknowledge(notice)} testID="notice-acknowledge" />
      {error ? <Text style={styles.error} role="alert">{error}</Text> : null}
    </View>
  );
}

export function NoticeView(props: Props) {
  const { notice, icsHref } = props;
  const c = notice.content;
  // The reader's own zone, so the notice reads the same as the overview and calendar beside it.
  const timeZone = useViewerTimeZone();
  const critical = c.slices.some((s) => s.critical);
  return (
    <DetailFrame
      kicker={notice.sequence > 0 ? `Notice · update ${notice.sequence}` : 'Notice'}
      title={c.cancelled ? `Cancelled: ${c.summary}` : c.summary}
      backHref="/notices"
      backLabel="Planned work"
      testID="notice-view"
      badges={<Badge label={c.cancelled ? 'Cancelled' : EFFECT_LABEL[c.effect]} tone={c.effect === 'interruption' && !c.cancelled ? 'danger' : 'primary'} />}
    >
      <View style={styles.when} testID="notice-when">
        <Text style={styles.whenLabel}>{`When (your zone: ${describeZone(timeZone)})`}</Text>
        <Text style={styles.whenValue} testID="notice-when-local">{formatWindowRange(c.startsAt, c.endsAt, timeZone)}</Text>
        <Text style={styles.whenLabel}>When (UTC)</Text>
        <Text style={styles.whenValue} testID="notice-when-utc">{formatUtcRange(c.startsAt, c.endsAt)}</Text>
      </View>
      {c.cancelled ? null : (
        <>
          <Text style={[styles.effect, c.effect === 'interruption' && styles.interruption]} testID="notice-effect">{c.effectText}</Text>
          {critical ? (
            <CriticalCaution testID="notice-critical-caution" title="Critical services are affected"
              lead="Some of the slices below carry critical services. Before the work:" />
          ) : null}
          <Section title="Your slices" testID="notice-slices">
            {c.slices.map((s) => <NoticeSliceCard key={s.slice} slice={s} />)}
            <Note>{c.afterWork}</Note>
          </Section>
        </>
      )}
      {c.leadOverrideReason ? (
        <View style={styles.override} testID="notice-override">
          <Text style={styles.overrideText}>{`Sent with less than the agreed ${c.leadDays} days of notice. Reason: ${c.leadOverrideReason}`}</Text>
        </View>
      ) : null}
      <Section title="Acknowledgement">
        <Acknowledgement {...props} timeZone={timeZone} />
      </Section>
      <Section title="Calendar">
        <Button label={c.cancelled ? 'Download the cancellation (.ics)' : 'Add to calendar (.ics)'} variant="quiet"
          onPress={() => void Linking.openURL(icsHref)} testID="notice-ics" />
      </Section>
      <Section title="Questions">
        <Text style={styles.contact} selectable>{`${c.contact.name}: ${c.contact.email}`}</Text>
      </Section>
    </DetailFrame>
  );
}

const styles = StyleSheet.create({
  when: { gap: space.xxs, padding: space.md, borderRadius: radii.lg, backgroundColor: colors.tide },
  whenLabel: { ...type.caption, color: colors.inkMuted },
  whenValue: { ...type.bodyStrong, color: colors.ink, marginBottom: space.xs },
  effect: { ...type.bodyStrong, color: colors.ink },
  interruption: { color: colors.danger },
  ackBox: { gap: space.sm, alignItems: 'flex-start' },
  acked: { ...type.bodyStrong, color: colors.primary },
  error: { ...type.body, color: colors.danger },
  override: { padding: space.md, borderRadius: radii.md, backgroundColor: colors.dangerSoft },
  overrideText: { ...type.body, color: colors.ink },
  contact: { ...type.body, color: colors.ink },
});
