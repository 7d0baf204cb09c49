// The invitee's form: whom the invitation is for, a password typed twice (checked before sending; the server also
// refuses passwords that are easy to guess), and a slot for the single sign-on button when the instance has one.
import { useState, type ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { Me } from '@/shared/api';
import { INVITEE_PASSWORD_MIN_CHARS, inviteePasswordSchema, type InvitationLink } from '@/shared/people';
import { useAcceptInvitationMutation } from '@/hooks/queries/people';
import { CLIENT_ERROR_CODES, isApiError } from '@/hooks/api-fetch';
import { AlertBanner } from '@/components/alert-banner';
import { Button } from '@/components/button';
import { NewPasswordFields } from '@/components/passwords/new-password-fields';
import { colors, space, type } from '@/constants/theme';

export const INVITE_PASSWORDS_DIFFER = 'The two passwords are not the same';

function acceptErrorMessage(error: unknown): string {
  if (!isApiError(error)) return 'Setting the password failed. Try again in a moment.';
  if (error.code === CLIENT_ERROR_CODES.network) return error.message;
  if (error.status === 429) return 'Too many attempts. Wait a minute, then try again.';
  if (error.status >= 400 && error.status < 500) return error.message;
  return 'Setting the password failed. Try again in a moment.';
}

type Props = { token: string; invitee: InvitationLink; onDone: (user: Me) => void; singleSignOn?: ReactNode };

export function InvitationForm({ token, invitee, onDone, singleSignOn }: Props) {
  const [password, setPassword] = useState('');
  const [again, setAgain] = useState('');
  const [errors, setErrors] = useState<{ password?: string; again?: string }>({});
  const accept = useAcceptInvitationMutation();

  const submit = () => {
    if (accept.isPending) return;
    const parsed = inviteePasswordSchema.safeParse(password);
    const found = {
      password: parsed.success ? undefined : parsed.error.issues[0]?.message,
      again: again === password ? undefined : INVITE_PASSWORDS_DIFFER,
    };
    setErrors(found);
    if (!found.password && !found.again) accept.mutate({ token, password }, { onSuccess: ({ user }) => onDone(user) });
  };

  return (
    <View style={styles.form} role="form" aria-label="Accept the invitation">
      <Text style={styles.intro} testID="invitation-for">
        Welcome, {invitee.name}. Choose a password for {invitee.email} to start using Slackwater.
      </Text>
      {singleSignOn ? <View style={styles.sso} testID="invitation-sso-slot">{singleSignOn}</View> : null}
      {accept.isError ? (
        <AlertBanner message={acceptErrorMessage(accept.error)} testID="invitation-error" />
      ) : null}
      <NewPasswordFields
        password={password}
        again={again}
        onChangePassword={setPassword}
        onChangeAgain={setAgain}
        passwordError={errors.password}
        againError={errors.again}
        passwordTestID="invitation-password"
        againTestID="invitation-password-again"
        passwordLabel={`Password (at least ${INVITEE_PASSWORD_MIN_CHARS} characters)`}
        againLabel="Password again"
        onSubmit={submit}
      />
      <Button label={accept.isPending ? 'Setting the password…' : 'Set password and sign in'} testID="invitation-submit" onPress={submit} busy={accept.isPending} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  intro: { ...type.body, color: colors.inkMuted },
  sso: { gap: space.sm },
});
