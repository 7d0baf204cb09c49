// The form a reset link opens: a new password typed twice; the server's policy feedback is shown as it comes.
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { PASSWORD_MIN_CHARS } from '@/shared/passwords';
import { useResetPasswordMutation } from '@/hooks/queries/passwords';
import { AlertBanner } from '@/components/alert-banner';
import { Button } from '@/components/button';
import { NewPasswordFields } from '@/components/passwords/new-password-fields';
import { checkNewPassword, passwordErrorMessage, type NewPasswordErrors } from '@/components/passwords/password-fields';
import { colors, space, type } from '@/constants/theme';

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
        <AlertBanner
          message={passwordErrorMessage(reset.error, 'Saving the password failed. Try again in a moment.')} testID="reset-password-error"
        />
      ) : null}
      <NewPasswordFields
        password={password} again={again} onChangePassword={setPassword} onChangeAgain={setAgain}
        passwordError={errors.password} againError={errors.again}
        passwordTestID="reset-password-new" againTestID="reset-password-again"
        passwordLabel={`New password (at least ${PASSWORD_MIN_CHARS} characters)`} againLabel="New password again"
        onSubmit={submit}
      />
      <Button label={reset.isPending ? 'Saving…' : 'Save the new password'} testID="reset-password-submit" onPress={submit} busy={reset.isPending} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  body: { ...type.body, color: colors.inkMuted },
});
