// The window page's sign-off block: a planner submits a planned window; anyone on staff opens its sign-off once submitted.
import { StyleSheet, Text, View } from 'react-native';
import type { Me } from '@/shared/api';
import { canSubmitForSignoff, isOperator } from '@/shared/permissions';
import type { Window } from '@/shared/windows';
import { useSubmitForSignoffMutation } from '@/hooks/queries/signoff';
import { Button } from '@/components/button';
import { Section } from '@/components/windows/section';
import { colors, space, type } from '@/constants/theme';

const SUBMITTED: readonly Window['status'][] = ['in-review', 'cleared', 'returned', 'notified', 'underway', 'done', 'rolled-back'];

type Props = { window: Window; me: Me; onOpenSignoff: () => void };

export function SubmitForSignoff({ window: w, me, onOpenSignoff }: Props) {
  const submit = useSubmitForSignoffMutation(w.id);
  const planner = canSubmitForSignoff(me.roles);
  const staff = isOperator(me.roles);
  if (w.status === 'planned' && planner) {
    return (
      <Section title="Sign-off" testID="window-signoff">
        <Text style={styles.body}>The accepted plan goes to the change board; every approver gets an e-mail.</Text>
        {submit.error ? <Text style={styles.error} role="alert" testID="window-submit-signoff-error">{submit.error.message}</Text> : null}
        <View style={styles.row}>
          <Button label="Submit for sign-off" onPress={() => submit.mutate()} busy={submit.isPending} testID="window-submit-signoff" />
        </View>
      </Section>
    );
  }
  if (!staff || !SUBMITTED.includes(w.status)) return null;
  return (
    <Section title="Sign-off" testID="window-signoff">
      {submit.data ? <Text style={styles.body} testID="window-signoff-submitted">Sent to {submit.data.approversMailed} approver{submit.data.approversMailed === 1 ? '' : 's'}.</Text> : null}
      <View style={styles.row}>
        <Button label="Open sign-off" variant="quiet" onPress={onOpenSignoff} testID="window-open-signoff" />
      </View>
    </Section>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  body: { ...type.body, color: colors.ink },
  error: { ...type.bodyStrong, color: colors.danger },
});
