// Demo data (admin): what the demo still holds, the confirmation, the removal's progress and its result.
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { DemoDataSummary, DemoRemovalResult } from '@/shared/demo-data';
import { AlertBanner } from '@/components/alert-banner';
import { Button } from '@/components/button';
import { countLines } from '@/components/demo-data/demo-kinds';
import { DemoRemovalDialog } from '@/components/demo-data/demo-removal-dialog';
import { colors, radii, space, type } from '@/constants/theme';

type Props = {
  summary: DemoDataSummary;
  removing: boolean;
  /** the server's refusal or failure, in words */
  error: string | null;
  onRemove: () => void;
};

/** What went, once the removal committed. */
export function DemoRemovalResultView({ result }: { result: DemoRemovalResult }) {
  return (
    <View style={styles.card} role="status" testID="demo-removal-result">
      <Text style={styles.heading} role="heading" aria-level={2}>The demo data is gone</Text>
      {countLines(result.removed).map((line) => <Text key={line.kind} style={styles.body}>• {line.text} removed</Text>)}
      {result.keptAccount ? (
        <Text style={styles.note}>
          You are still signed in as {result.keptAccount.email}: change that account&apos;s e-mail address and password now.
        </Text>
      ) : null}
    </View>
  );
}

export function DemoDataPanel({ summary, removing, error, onRemove }: Props) {
  const [confirming, setConfirming] = useState(false);
  return (
    <View style={styles.column} testID="demo-data-panel">
      <Text style={styles.title} role="heading" aria-level={1}>Demo data</Text>
      <View style={styles.card}>
        <Text style={styles.body}>
          This instance still holds the invented demo network, its windows and the demo accounts, which everyone can
          sign in to with the published password. Remove them before the tool holds real data.
        </Text>
        {countLines(summary.counts).map((line) => <Text key={line.kind} style={styles.body}>• {line.text}</Text>)}
        {!confirming ? <Button label="Remove demo data…" testID="demo-data-remove" onPress={() => setConfirming(true)} /> : null}
      </View>
      {error ? <AlertBanner message={error} testID="demo-removal-error" /> : null}
      {confirming ? (
        <DemoRemovalDialog summary={summary} removing={removing} onConfirm={onRemove} onCancel={() => setConfirming(false)} />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  column: { gap: space.lg },
  card: { backgroundColor: colors.surface, borderRadius: radii.lg, borderWidth: 1, borderColor: colors.border, padding: space.xl, gap: space.sm },
  title: { ...type.title, color: colors.ink },
  heading: { ...type.heading, color: colors.ink },
  body: { ...type.body, color: colors.ink },
  note: { ...type.bodyStrong, color: colors.warning },
});
