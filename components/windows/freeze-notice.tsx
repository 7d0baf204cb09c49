// Shown when the server refuses a booking inside a freeze: what happened, and for admins a written override.
import { StyleSheet, Text, View } from 'react-native';
import { TextField } from '@/components/text-field';
import { colors, radii, space, type } from '@/constants/theme';

type Props = {
  message: string;
  canOverride: boolean;
  reason: string;
  onReasonChange: (reason: string) => void;
  reasonError?: string;
  disabled?: boolean;
};

export function FreezeNotice({ message, canOverride, reason, onReasonChange, reasonError, disabled = false }: Props) {
  return (
    <View style={styles.box} role="alert" testID="window-freeze-refusal">
      <Text style={styles.title}>These times fall inside a freeze</Text>
      <Text style={styles.body}>{message}</Text>
      {canOverride ? (
        <>
          <Text style={styles.body}>
            As an admin you may book it anyway. Write why the work cannot wait; the reason is recorded with the window.
          </Text>
          <TextField
            label="Reason for booking inside the freeze"
            testID="window-override-reason"
            value={reason}
            onChangeText={onReasonChange}
            error={reasonError}
            multiline
            editable={!disabled}
          />
        </>
      ) : (
        <Text style={styles.body}>Pick times outside the freeze, or ask an admin to book it with a written reason.</Text>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm, padding: space.md, borderRadius: radii.md, backgroundColor: colors.dangerSoft, borderLeftWidth: 4, borderLeftColor: colors.danger },
  title: { ...type.heading, color: colors.danger },
  body: { ...type.body, color: colors.ink },
});
