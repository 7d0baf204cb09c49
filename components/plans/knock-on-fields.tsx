// The run form's knock-on choice: may the search move slices the work does not touch to free room for affected
// ones, and at most how many per plan.
import { StyleSheet, Switch, Text, View } from 'react-native';
import { TextField } from '@/components/text-field';
import { colors, space, type } from '@/constants/theme';

type Props = {
  on: boolean;
  max: string;
  error?: string;
  onToggle: (on: boolean) => void;
  onMax: (text: string) => void;
};

export function KnockOnFields({ on, max, error, onToggle, onMax }: Props) {
  return (
    <View style={styles.box} testID="plan-form-knock-on">
      <Text style={styles.label}>Untouched slices</Text>
      <View style={styles.row}>
        <Switch value={on} onValueChange={onToggle} testID="plan-form-knock-on-switch" accessibilityLabel="Allow moves of untouched slices" />
        <Text style={styles.body}>Allow moves of untouched slices</Text>
      </View>
      <Text style={styles.hint}>
        {on
          ? 'When an affected slice finds no room, the search may move or reroute a slice the work does not touch to free it. Each such move is paid at its move cost, and its tenant is told.'
          : 'Only slices the work touches are moved; an affected slice that finds no room stays unresolved.'}
      </Text>
      <View style={styles.number}>
        <TextField
          label="Most knock-on moves" value={max} onChangeText={onMax} keyboardType="number-pad" editable={on}
          error={error} testID="plan-form-max-knock-on"
        />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  label: { ...type.label, color: colors.ink },
  body: { ...type.body, color: colors.ink },
  hint: { ...type.caption, color: colors.inkMuted },
  number: { maxWidth: 220 },
});
