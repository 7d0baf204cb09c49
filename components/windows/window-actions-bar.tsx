// The quiet actions on a window beside its next step (by role and state); withdrawing and rolling back ask once more.
// The one filled button is the next-step bar's; everything here is secondary.
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { Button } from '@/components/button';
import type { WindowActions } from '@/components/windows/lifecycle';
import { RollBackCaution } from '@/components/windows/roll-back-caution';
import { colors, radii, space, type } from '@/constants/theme';

type Props = {
  windowId: string;
  actions: WindowActions;
  onEdit: () => void;
  onAssess: () => void;
  onOpenImpact: () => void;
  onWithdraw: () => void;
  onRollBack: () => void;
  assessing: boolean;
  /** a withdrawal or roll-back is being sent */
  transitioning: boolean;
  impactStored: boolean;
};

export function WindowActionsBar(props: Props) {
  const { actions } = props;
  const [confirming, setConfirming] = useState<'withdraw' | 'roll-back' | null>(null);
  if (confirming === 'withdraw') {
    return (
      <View style={styles.confirm} testID="window-withdraw-confirm">
        <Text style={styles.body}>Withdraw this window? It stays on record but no longer takes anything out.</Text>
        <View style={styles.row}>
          <Button label="Withdraw window" onPress={props.onWithdraw} busy={props.transitioning} testID="window-withdraw-yes" />
          <Button label="Keep it" variant="quiet" onPress={() => setConfirming(null)} disabled={props.transitioning} />
        </View>
      </View>
    );
  }
  if (confirming === 'roll-back') {
    return (
      <View style={styles.confirm} testID="window-roll-back-confirm">
        <RollBackCaution windowId={props.windowId} />
        <Text style={styles.body}>
          Roll back the work? Every slice the plan moved goes back to where it was before the window, and the window
          ends as Rolled back. Do this only once the equipment is back in its state from before the work.
        </Text>
        <View style={styles.row}>
          <Button label="Roll back and restore slices" onPress={props.onRollBack} busy={props.transitioning} testID="window-roll-back-yes" />
          <Button label="Keep the work going" variant="quiet" onPress={() => setConfirming(null)} disabled={props.transitioning} />
        </View>
      </View>
    );
  }
  return (
    <View style={styles.row}>
      {actions.viewImpact && props.impactStored ? (
        <Button label="Impact review" variant="quiet" onPress={props.onOpenImpact} testID="window-open-impact" />
      ) : null}
      {/* Before the first assessment the next-step bar offers it; afterwards re-assessing is a side action. */}
      {actions.assess && props.impactStored ? (
        <Button label="Assess again" variant="quiet" onPress={props.onAssess} busy={props.assessing} testID="window-assess" />
      ) : null}
      {actions.edit ? <Button label="Edit" variant="quiet" onPress={props.onEdit} testID="window-edit" /> : null}
      {actions.withdraw ? <Button label="Withdraw" variant="quiet" onPress={() => setConfirming('withdraw')} testID="window-withdraw" /> : null}
      {actions.rollBack ? <Button label="Roll back" variant="quiet" onPress={() => setConfirming('roll-back')} testID="window-roll-back" /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  confirm: { gap: space.sm, padding: space.md, borderRadius: radii.md, backgroundColor: colors.surfaceSunken },
  body: { ...type.body, color: colors.ink },
});
