// The form a reset link opens: a new password typed twice; the server's policy feedback is shown as it comes.
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { PASSWORD_MIN_CHARS } from '@/shared/passwords';
import { useResetPasswordMutation } from '@/hooks/queries/passwords';
import { Button } from '@/components/button';
import { TextField } from '@/components/text-field';
import { checkNewPassword, passwordErrorMessage, type NewPasswordErrors } from '@/components/passwords/password-fields';
import { colors, radii, space, type } from '@/constants/theme';

export function ResetPasswordForm({ token, onDone }: { token: string; onDone: () => void }) {
  const [password, setPassword] = useState('');
  const [again, setAgain] = useState('');
  const [errors, setErrors] = useState<NewPasswordErrors>({});
  const reset = useResetPasswordMutation();
  const submit = () => {
    if (reset.isPending) return;
    const found = checkNewPassword(password, again);
    setErrors(found);
    if (found.password || found.again) return;
    reset.mutate({ token, password }, { onSuccess: onDone });
  };
  return (
    <View style={styles.form} role="form" aria-label="Choose a new password">
      <Text style={styles.body}>
        Choose a password you use nowhere else. A few unrelated words make a strong one. Saving it signs you out everywhere.
      </Text>
      {reset.isError ? (
        <View style={styles.banner} role="alert" testID="reset-password-error">
          <Text style={styles.bannerText}>{passwordErrorMessage(reset.error, 'Saving the password failed. Try again in a moment.')}</Text>
        </View>
      ) : null}
      <TextField
        label={`New password (at least ${PASSWORD_MIN_CHARS} characters)`} testID="reset-password-new" value={password}
        onChangeText={setPassword} error={errors.password} secureTextEntry autoComplete="new-password"
      />
      <TextField
        label="New password again" testID="reset-password-again" value={again} onChangeText={setAgain}
        error={errors.again} secureTextEntry autoComplete="new-password" onSubmitEditing={submit}
      />
      <Button label={reset.isPending ? 'Saving…' : 'Save the new password'} testID="reset-password-submit" onPress={submit} busy={reset.isPending} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  body: { ...type.body, color: colors.inkMuted },
  banner: { backgroundColor: colors.dangerSoft, borderRadius: radii.md, padding: space.md },
  bannerText: { ...type.bodyStrong, color: colors.danger },
});
