// The window page's sign-off block: anyone on staff opens a window's sign-off once submitted. Submitting is the
// next-step bar's job (components/windows/window-next-step.tsx), so the window has one filled button.
import { StyleSheet, View } from 'react-native';
import type { Me } from '@/shared/api';
import { isOperator } from '@/shared/permissions';
import type { Window } from '@/shared/windows';
import { Button } from '@/components/button';
import { Section } from '@/components/windows/section';
import { space } from '@/constants/theme';

const SUBMITTED: readonly Window['status'][] = ['in-review', 'cleared', 'returned', 'notified', 'underway', 'done', 'rolled-back'];

type Props = { window: Window; me: Me; onOpenSignoff: () => void };

export function SubmitForSignoff({ window: w, me, onOpenSignoff }: Props) {
  const staff = isOperator(me.roles);
  if (!staff || !SUBMITTED.includes(w.status)) return null;
  return (
    <Section title="Sign-off" testID="window-signoff">
      <View style={styles.row}>
        <Button label="Open sign-off" variant="quiet" onPress={onOpenSignoff} testID="window-open-signoff" />
      </View>
    </Section>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
