// The first admin's form: name, e-mail and a password typed twice, checked with the shared schema before sending.
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { Me } from '@/shared/api';
import { ADMIN_PASSWORD_MIN_CHARS, newAdminSchema, type NewAdmin } from '@/shared/setup';
import { useSetUpMutation } from '@/hooks/queries/setup';
import { CLIENT_ERROR_CODES, isApiError } from '@/hooks/api-fetch';
import { AlertBanner } from '@/components/alert-banner';
import { Button } from '@/components/button';
import { NewPasswordFields } from '@/components/passwords/new-password-fields';
import { TextField } from '@/components/text-field';
import { colors, space, type } from '@/constants/theme';

type Field = 'name' | 'email' | 'password' | 'passwordAgain';
type FieldErrors = Partial<Record<Field, string>>;
type Values = Record<Field, string>;

export const PASSWORDS_DIFFER = 'The two passwords are not the same';

/** The admin to create, or the message for each field that is not right yet. */
export function validateSetUp(values: Values): { input: NewAdmin | null; errors: FieldErrors } {
  const parsed = newAdminSchema.safeParse({ name: values.name, email: values.email.trim(), password: values.password });
  const errors: FieldErrors = {};
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const field = issue.path[0] as Field;
      errors[field] ??= issue.message;
    }
  }
  if (values.passwordAgain !== values.password) errors.passwordAgain = PASSWORDS_DIFFER;
  return { input: parsed.success && !errors.passwordAgain ? parsed.data : null, errors };
}

function setUpErrorMessage(error: unknown): string {
  if (!isApiError(error)) return 'Creating the account failed. Try again in a moment.';
  if (error.code === CLIENT_ERROR_CODES.network) return error.message;
  if (error.status === 429) return 'Too many attempts. Wait a minute, then try again.';
  if (error.status >= 400 && error.status < 500) return error.message;
  return 'Creating the account failed. Try again in a moment.';
}

export function SetUpForm({ token, onDone }: { token: string; onDone: (user: Me) => void }) {
  const [values, setValues] = useState<Values>({ name: '', email: '', password: '', passwordAgain: '' });
  const [errors, setErrors] = useState<FieldErrors>({});
  const setUp = useSetUpMutation();
  const change = (field: Field) => (text: string) => setValues((v) => ({ ...v, [field]: text }));

  const submit = () => {
    if (setUp.isPending) return;
    const { input, errors: found } = validateSetUp(values);
    setErrors(found);
    if (!input) return;
    setUp.mutate({ ...input, token }, { onSuccess: ({ user }) => onDone(user) });
  };

  return (
    <View style={styles.form} role="form" aria-label="Create the first admin">
      <Text style={styles.intro}>
        This Slackwater has no admin yet. The account you create here can add the other people and load the network.
      </Text>
      {setUp.isError ? (
        <AlertBanner message={setUpErrorMessage(setUp.error)} testID="set-up-error" />
      ) : null}
      <TextField label="Your name" testID="set-up-name" value={values.name} onChangeText={change('name')} error={errors.name} autoComplete="name" />
      <TextField
        label="E-mail"
        testID="set-up-email"
        value={values.email}
        onChangeText={change('email')}
        error={errors.email}
        autoCapitalize="none"
        autoComplete="email"
        autoCorrect={false}
        inputMode="email"
      />
      <NewPasswordFields
        password={values.password}
        again={values.passwordAgain}
        onChangePassword={change('password')}
        onChangeAgain={change('passwordAgain')}
        passwordError={errors.password}
        againError={errors.passwordAgain}
        passwordTestID="set-up-password"
        againTestID="set-up-password-again"
        passwordLabel={`Password (at least ${ADMIN_PASSWORD_MIN_CHARS} characters)`}
        againLabel="Password again"
        onSubmit={submit}
      />
      <Button label={setUp.isPending ? 'Creating the account…' : 'Create admin and sign in'} testID="set-up-submit" onPress={submit} busy={setUp.isPending} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  intro: { ...type.body, color: colors.inkMuted },
});
