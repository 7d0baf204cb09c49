// Setting up one-time codes inside a decision, wired to the API: start, add the key (open the app on this phone,
// scan the QR code from another device, or type the key), confirm the first code; then the decision goes on.
import { StyleSheet, Text, View } from 'react-native';
import { useOtpConfirmMutation, useOtpEnrolMutation } from '@/hooks/queries/signoff';
import { Button } from '@/components/button';
import { OtpKeySteps } from '@/components/signoff/otp-key-steps';
import { colors, radii, space, type } from '@/constants/theme';

type Props = {
  /** said above the steps, e.g. when the approver pressed a decision before setting codes up */
  prompt: string | null;
  /** codes are confirmed (the status query is updated by the mutation too) */
  onEnrolled: () => void;
};

export function InlineOtpEnrol({ prompt, onEnrolled }: Props) {
  const enrol = useOtpEnrolMutation();
  const confirm = useOtpConfirmMutation();
  const error = enrol.error ?? confirm.error;
  return (
    <View style={styles.box} testID="otp-inline-enrol">
      <Text style={styles.strong}>This decision needs a one-time code, and you have not set codes up yet.</Text>
      <Text style={styles.body}>Set them up here; your comment stays as typed and you decide right after.</Text>
      {prompt ? <Text style={styles.warn} role="alert" testID="otp-inline-prompt">{prompt}</Text> : null}
      {error ? <Text style={styles.error} role="alert" testID="otp-error">{error.message}</Text> : null}
      {enrol.data ? (
        <OtpKeySteps
          enrolment={enrol.data} confirming={confirm.isPending}
          onConfirm={(code) => confirm.mutate(code, { onSuccess: onEnrolled })}
        />
      ) : (
        <Button label="Set up one-time codes" variant="quiet" onPress={() => enrol.mutate()} busy={enrol.isPending} testID="signoff-enrol" />
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.md, padding: space.md, borderRadius: radii.md, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.tide },
  strong: { ...type.bodyStrong, color: colors.ink },
  body: { ...type.body, color: colors.ink },
  warn: { ...type.bodyStrong, color: colors.warning },
  error: { ...type.bodyStrong, color: colors.danger },
});
