// The confirmation before removing the demo: every kind that goes with its count, the account that stays, and the
// confirmation words typed in full before the remove button works.
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { DEMO_REMOVAL_CONFIRMATION, type DemoDataSummary } from '@/shared/demo-data';
import { Button } from '@/components/button';
import { TextField } from '@/components/text-field';
import { countLines } from '@/components/demo-data/demo-kinds';
import { colors, radii, space, type } from '@/constants/theme';

type Props = { summary: DemoDataSummary; removing: boolean; onConfirm: () => void; onCancel: () => void };

export function DemoRemovalDialog({ summary, removing, onConfirm, onCancel }: Props) {
  const [typed, setTyped] = useState('');
  const confirmed = typed.trim().toLowerCase() === DEMO_REMOVAL_CONFIRMATION;
  return (
    <View style={styles.dialog} role="alertdialog" aria-label="Remove the demo data?" testID="demo-removal-dialog">
      <Text style={styles.title} role="heading" aria-level={2}>Remove the demo data?</Text>
      <Text style={styles.body}>This removes, in one step that cannot be undone:</Text>
      <View role="list" testID="demo-removal-counts">
        {countLines(summary.counts).map((line) => (
          <Text key={line.kind} role="listitem" style={styles.item} testID={`demo-removal-count-${line.kind}`}>• {line.text}</Text>
        ))}
      </View>
      {summary.accountNames.length > 0 ? (
        <Text style={styles.body}>Demo accounts that go: {summary.accountNames.join(', ')}.</Text>
      ) : null}
      {summary.keptAccount ? (
        <Text style={styles.note} testID="demo-removal-kept-account">
          Your own account ({summary.keptAccount.name}, {summary.keptAccount.email}) stays so that you are not locked out. It is a
          demo account: change its e-mail address and password straight after, or create your own admin and remove this one.
        </Text>
      ) : null}
      <Text style={styles.body}>
        Windows, slices and sites that you imported or made yourself stay, unless they sit on a demo site or span.
      </Text>
      <TextField
        label={`Type "${DEMO_REMOVAL_CONFIRMATION}" to confirm`}
        testID="demo-removal-confirm-text"
        value={typed}
        onChangeText={setTyped}
        autoCapitalize="none"
        autoCorrect={false}
      />
      <View style={styles.actions}>
        <Button
          label={removing ? 'Removing the demo data…' : 'Remove demo data'}
          testID="demo-removal-confirm"
          onPress={onConfirm}
          disabled={!confirmed}
          busy={removing}
        />
        <Button label="Keep it" variant="quiet" testID="demo-removal-cancel" onPress={onCancel} disabled={removing} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  dialog: {
    backgroundColor: colors.surface, borderRadius: radii.lg, borderWidth: 1, borderColor: colors.danger, padding: space.xl, gap: space.md,
  },
  title: { ...type.heading, color: colors.ink },
  body: { ...type.body, color: colors.ink },
  item: { ...type.body, color: colors.ink, paddingLeft: space.sm },
  note: { ...type.bodyStrong, color: colors.warning },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
