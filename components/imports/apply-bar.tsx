// Apply, with a confirmation step: only an explicit second press writes. Disabled while the preview has errors.
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { ImportCounts, ImportStatus } from '@/shared/imports';
import { Button } from '@/components/button';
import { colors, radii, space, type } from '@/constants/theme';

type Props = { counts: ImportCounts; status: ImportStatus; onApply: () => void; applying: boolean; applyError: string | null };

/** Why Apply cannot be pressed, or null when it can. */
export function applyBlocker(counts: ImportCounts, status: ImportStatus): string | null {
  if (status === 'applied') return 'This import has been applied.';
  if (status !== 'previewed') return `This import is ${status} and can no longer be applied; upload the file again.`;
  if (counts.errors > 0) return 'Fix the errors in the file and upload it again; an import with errors cannot be applied.';
  if (counts.adds + counts.changes + counts.removes === 0) return 'Nothing to apply: the file matches what is stored.';
  return null;
}

export function ApplyBar({ counts, status, onApply, applying, applyError }: Props) {
  const [confirming, setConfirming] = useState(false);
  const blocker = applyBlocker(counts, status);
  if (confirming && !blocker) {
    return (
      <View style={[styles.box, styles.confirm]} testID="import-confirm">
        <Text style={styles.title}>Apply this import?</Text>
        <Text style={styles.text}>
          {`${counts.adds} to add, ${counts.changes} to change, ${counts.removes} to remove — written together in one step, recorded in the audit log.`}
        </Text>
        {applyError ? <Text style={styles.error} role="alert" testID="import-apply-error">{applyError}</Text> : null}
        <View style={styles.actions}>
          <Button label="Apply now" testID="import-confirm-apply" busy={applying} onPress={onApply} />
          <Button label="Cancel" variant="quiet" testID="import-confirm-cancel" disabled={applying} onPress={() => setConfirming(false)} />
        </View>
      </View>
    );
  }
  return (
    <View style={styles.box}>
      <Button label="Apply…" testID="import-apply" disabled={blocker !== null} onPress={() => setConfirming(true)} />
      {blocker ? <Text style={styles.text} testID="import-apply-blocked">{blocker}</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm },
  confirm: { backgroundColor: colors.primarySoft, borderRadius: radii.lg, padding: space.md },
  title: { ...type.heading, color: colors.ink },
  text: { ...type.body, color: colors.inkMuted },
  error: { ...type.body, color: colors.danger },
  actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
});
