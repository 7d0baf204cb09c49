// E-mail + password form: validates with the shared schema before calling the API, then shows the server's answer.
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { signInRequestSchema, type Me } from '@/shared/api';
import { useSignInMutation } from '@/hooks/queries/me';
import { AlertBanner } from '@/components/alert-banner';
import { Button } from '@/components/button';
import { TextField } from '@/components/text-field';
import { signInErrorMessage } from '@/components/sign-in-errors';
import { space } from '@/constants/theme';

type FieldErrors = { email?: string; password?: string };

function validate(email: string, password: string) {
  const parsed = signInRequestSchema.safeParse({ email: email.trim(), password });
  if (parsed.success) return { input: parsed.data, errors: {} as FieldErrors };
  const errors: FieldErrors = {};
  for (const issue of parsed.error.issues) {
    const field = issue.path[0];
    if ((field === 'email' || field === 'password') && !errors[field]) errors[field] = issue.message;
  }
  return { input: null, errors };
}

export function SignInForm({ onSignedIn }: { onSignedIn: (user: Me) => void }) {
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const [fieldErrors, setFieldErrors] = useState<FieldErrors>({});
  const signIn = useSignInMutation();

  const submit = () => {
    if (signIn.isPending) return;
    const { input, errors } = validate(email, password);
    setFieldErrors(errors);
    if (!input) return;
    signIn.mutate(input, { onSuccess: ({ user }) => onSignedIn(user) });
  };

  return (
    <View style={styles.form} role="form" aria-label="Sign in">
      {signIn.isError ? (
        <AlertBanner message={signInErrorMessage(signIn.error)} testID="sign-in-error" />
      ) : null}
      <TextField
        label="E-mail"
        testID="sign-in-email"
        value={email}
        onChangeText={setEmail}
        error={fieldErrors.email}
        autoCapitalize="none"
        autoComplete="email"
        autoCorrect={false}
        inputMode="email"
        onSubmitEditing={submit}
      />
      <TextField
        label="Password"
        testID="sign-in-password"
        value={password}
        onChangeText={setPassword}
        error={fieldErrors.password}
        secureTextEntry
        autoComplete="current-password"
        onSubmitEditing={submit}
      />
      <Button label={signIn.isPending ? 'Signing in…' : 'Sign in'} testID="sign-in-submit" onPress={submit} busy={signIn.isPending} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
});
