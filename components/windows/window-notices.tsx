// One-time notes after a save (booked, sent back to draft, MOP upload failed) and standing cautions on a window.
import { StyleSheet, Text, View } from 'react-native';
import type { Window } from '@/shared/windows';
import { calendarColors, colors, radii, space, type } from '@/constants/theme';

/** What the previous screen reports about the save that led here (from the route's search params). */
export type WindowFlash = { saved?: 'booked' | 'edited'; reverted?: boolean; mopError?: string | null };

export const REVERTED_MESSAGE =
  'Your change to the times or equipment sent this window back to draft: its earlier impact no longer holds. Assess it again.';

function Note({ text, tone, testID }: { text: string; tone: 'info' | 'warn' | 'danger'; testID: string }) {
  const toneStyle = tone === 'info' ? styles.info : tone === 'warn' ? styles.warn : styles.danger;
  return (
    <View style={[styles.note, toneStyle]} role={tone === 'info' ? undefined : 'alert'} testID={testID}>
      <Text style={styles.text}>{text}</Text>
    </View>
  );
}

export function WindowNotices({ flash, window }: { flash: WindowFlash; window: Window }) {
  return (
    <>
      {flash.saved === 'booked' ? <Note tone="info" text="Window booked." testID="window-flash-booked" /> : null}
      {flash.saved === 'edited' && !flash.reverted ? <Note tone="info" text="Changes saved." testID="window-flash-saved" /> : null}
      {flash.reverted ? <Note tone="warn" text={REVERTED_MESSAGE} testID="window-flash-reverted" /> : null}
      {flash.mopError ? (
        <Note tone="danger" text={`The window is saved, but the MOP did not upload: ${flash.mopError} Use Edit to attach it again.`} testID="window-flash-mop" />
      ) : null}
      {window.conflictCount > 0 ? (
        <Note tone="danger" text={`Collides with ${window.conflictCount} other window${window.conflictCount === 1 ? '' : 's'}: see Conflicts below.`} testID="window-conflict-note" />
      ) : null}
      {window.touchesCritical ? (
        <Note tone="warn" text="Touches a critical slice (emergency, health or utility service). See the impact review's caution." testID="window-critical-note" />
      ) : null}
    </>
  );
}

const styles = StyleSheet.create({
  note: { padding: space.md, borderRadius: radii.md, borderLeftWidth: 4 },
  info: { backgroundColor: colors.primarySoft, borderLeftColor: colors.primary },
  warn: { backgroundColor: calendarColors.criticalSoft, borderLeftColor: calendarColors.critical },
  danger: { backgroundColor: colors.dangerSoft, borderLeftColor: colors.danger },
  text: { ...type.body, color: colors.ink },
});
