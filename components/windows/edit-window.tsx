// Editing a window against the version it was loaded at: a stale edit is refused, the input kept, reload offered.
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { Me } from '@/shared/api';
import { canBookInsideFreeze } from '@/shared/permissions';
import type { Window } from '@/shared/windows';
import { useBookingPolicies, useWindowMopUploadMutation, useWindowPatchMutation } from '@/hooks/queries/windows';
import { Button } from '@/components/button';
import type { SavedOutcome } from '@/components/windows/book-window';
import { windowPatchFor } from '@/components/windows/window-changes';
import { WindowForm, type WindowSubmission } from '@/components/windows/window-form';
import { formValuesFromWindow } from '@/components/windows/window-form-state';
import { tenantsWereTold } from '@/components/windows/window-time-change';
import { SAVE_MESSAGES, saveErrorView } from '@/components/windows/window-save-errors';
import { colors, radii, space, type } from '@/constants/theme';

type Props = {
  window: Window;
  me: Me;
  timeZone: string;
  /** Re-reads the window from the server (its newer version); the form keeps what the user typed. */
  onReload: () => Promise<unknown>;
  reloading: boolean;
  onSaved: (outcome: SavedOutcome) => void;
  onCancel: () => void;
};

function StaleNotice({ onReload, reloading }: { onReload: () => void; reloading: boolean }) {
  return (
    <View style={styles.stale} role="alert" testID="window-stale">
      <Text style={styles.staleText}>{SAVE_MESSAGES.stale}</Text>
      <Text style={styles.body}>Your changes are still in the form. After reloading, check them and save again.</Text>
      <Button label="Reload" variant="quiet" onPress={onReload} busy={reloading} testID="window-reload" />
    </View>
  );
}

export function EditWindow({ window, me, timeZone, onReload, reloading, onSaved, onCancel }: Props) {
  const policy = useBookingPolicies();
  const patch = useWindowPatchMutation(window.id);
  const upload = useWindowMopUploadMutation();
  const [initialValues] = useState(() => formValuesFromWindow(window, timeZone));
  const [reloaded, setReloaded] = useState(false);
  const stale = saveErrorView(patch.error).stale;

  const save = async ({ output, freezeOverrideReason, mop }: WindowSubmission) => {
    let saved;
    try {
      saved = await patch.mutateAsync(windowPatchFor(window, output, freezeOverrideReason));
    } catch {
      return;
    }
    const mopError = mop ? await upload.mutateAsync({ id: window.id, file: mop }).then(() => null, (e: Error) => e.message) : null;
    onSaved({ id: window.id, reverted: saved.reverted, conflictCount: saved.conflictCount, mopError });
  };

  const reload = async () => {
    await onReload();
    patch.reset();
    setReloaded(true);
  };

  const notice = stale ? (
    <StaleNotice onReload={() => void reload()} reloading={reloading} />
  ) : reloaded ? (
    <Text style={styles.body} testID="window-reloaded">Loaded the latest version of this window. Your edits are still here; saving now applies them on top.</Text>
  ) : null;

  return (
    <WindowForm
      initialValues={initialValues}
      timeZone={timeZone}
      policy={policy}
      submitLabel="Save changes"
      submitting={patch.isPending || upload.isPending}
      saveError={stale ? null : patch.error}
      canOverrideFreeze={canBookInsideFreeze(me.roles)}
      storedMopName={window.mop?.fileName ?? null}
      onSubmit={(submission) => void save(submission)}
      onCancel={onCancel}
      notice={notice}
      notifiedTimes={tenantsWereTold(window.status) ? initialValues : undefined}
    />
  );
}

const styles = StyleSheet.create({
  stale: { gap: space.sm, padding: space.md, borderRadius: radii.md, backgroundColor: colors.dangerSoft, borderLeftWidth: 4, borderLeftColor: colors.danger },
  staleText: { ...type.bodyStrong, color: colors.danger },
  body: { ...type.body, color: colors.ink },
});
