// "Forgot your password?": an e-mail address, then the one answer the server gives to every address.
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { forgotPasswordRequestSchema } from '@/shared/passwords';
import { useForgotPasswordMutation } from '@/hooks/queries/passwords';
import { AlertBanner } from '@/components/alert-banner';
import { Button } from '@/components/button';
import { TextField } from '@/components/text-field';
import { passwordErrorMessage } from '@/components/passwords/password-fields';
import { colors, radii, space, type } from '@/constants/theme';

export function ForgotPasswordForm() {
  const [email, setEmail] = useState('');
  const [error, setError] = useState<string | undefined>();
  const ask = useForgotPasswordMutation();
  const submit = () => {
    if (ask.isPending) return;
    const parsed = forgotPasswordRequestSchema.safeParse({ email: email.trim() });
    setError(parsed.success ? undefined : parsed.error.issues[0]?.message);
    if (parsed.success) ask.mutate(parsed.data);
  };
  if (ask.isSuccess) {
    return (
      <View style={styles.form}>
        <View style={styles.note} role="status" testID="forgot-password-sent">
          <Text style={styles.noteText}>{ask.data.message}</Text>
        </View>
        <Text style={styles.body}>No mail after a few minutes? Check the address and your spam folder, then ask again.</Text>
      </View>
    );
  }
  return (
    <View style={styles.form} role="form" aria-label="Ask for a password reset link">
      <Text style={styles.body}>Enter the e-mail address of your account. We send a link to choose a new password.</Text>
      {ask.isError ? (
        <AlertBanner
          message={passwordErrorMessage(ask.error, 'Sending the link failed. Try again in a moment.')} testID="forgot-password-error"
        />
      ) : null}
      <TextField
        label="E-mail" testID="forgot-password-email" value={email} onChangeText={setEmail} error={error}
        autoCapitalize="none" autoComplete="email" autoCorrect={false} inputMode="email" onSubmitEditing={submit}
      />
      <Button label={ask.isPending ? 'Sending…' : 'Send the link'} testID="forgot-password-submit" onPress={submit} busy={ask.isPending} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  body: { ...type.body, color: colors.inkMuted },
  note: { backgroundColor: colors.primarySoft, borderRadius: radii.md, padding: space.md },
  noteText: { ...type.bodyStrong, color: colors.ink },
});
