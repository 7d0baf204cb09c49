// The pack's opening sections: the window (what, when in the reader's zone, who owns it, what it takes out), its
// MOP, the critical-service caution where the plan moves such slices, and the impact counts every screen shows.
import { StyleSheet, Text, View } from 'react-native';
import type { ChangePack } from '@/shared/change-pack';
import type { WindowStatus } from '@/shared/windows';
import { CriticalCaution } from '@/components/critical-caution';
import { TouchCountsView } from '@/components/impact/touch-counts';
import { listWords } from '@/components/plans/plan-format';
import { describeZone, formatDuration, formatWindowRange } from '@/components/time';
import { Section } from '@/components/windows/section';
import { StatusBadge } from '@/components/windows/status-badge';
import { effectText } from '@/components/windows/window-elements-list';
import { colors, space, type } from '@/constants/theme';

type Props = { pack: ChangePack; timeZone: string };

function Fact({ label, value, testID }: { label: string; value: string; testID: string }) {
  return (
    <View style={styles.fact} testID={testID}>
      <Text style={styles.label}>{label}</Text>
      <Text style={styles.body}>{value}</Text>
    </View>
  );
}

export function PackWindowFacts({ pack, timeZone }: Props) {
  const w = pack.window;
  const lasts = formatDuration(Date.parse(w.endsAt) - Date.parse(w.startsAt));
  const elements = w.elements.map((e) => `${e.name} (${e.kind}, ${effectText(e).toLowerCase()})`);
  return (
    <Section title="The window" testID="pack-window">
      <StatusBadge status={w.status as WindowStatus} testID="pack-window-status" />
      <Fact label="When" value={`${formatWindowRange(w.startsAt, w.endsAt, timeZone)} · lasts ${lasts} · times in ${describeZone(timeZone)}`} testID="pack-window-when" />
      <Fact label="Work" value={w.workType ?? 'Not given'} testID="pack-window-work" />
      <Fact label="Owner" value={w.ownerName ?? 'No longer listed'} testID="pack-window-owner" />
      <Fact label="Taken out" value={elements.join('; ') || 'No sites or spans listed'} testID="pack-window-elements" />
      <Fact label="Method of procedure (MOP)" value={pack.mop ? pack.mop.fileName : 'No MOP attached'} testID="pack-mop" />
    </Section>
  );
}

export function PackCaution({ pack }: { pack: ChangePack }) {
  const critical = pack.plan?.criticalSlices ?? [];
  if (critical.length === 0) return null;
  return (
    <CriticalCaution
      testID="pack-critical-caution" title="Critical services are moved"
      lead={`${listWords(critical)} ${critical.length === 1 ? 'carries' : 'carry'} public-safety, health or utility services.`}
    />
  );
}

export function PackImpact({ pack }: { pack: ChangePack }) {
  return (
    <Section title="Impact" testID="pack-impact">
      {pack.touch ? <TouchCountsView counts={pack.touch} showDefinitions /> : (
        <Text style={styles.body} testID="pack-impact-none">The impact has not been assessed yet.</Text>
      )}
    </Section>
  );
}

const styles = StyleSheet.create({
  fact: { gap: space.xxs },
  label: { ...type.label, color: colors.inkMuted },
  body: { ...type.body, color: colors.ink },
});
