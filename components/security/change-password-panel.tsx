// "Change password" on the Security screen: the current password, a new one twice; the other sessions end.
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { PASSWORD_MIN_CHARS } from '@/shared/passwords';
import { useChangePasswordMutation } from '@/hooks/queries/passwords';
import { AlertBanner } from '@/components/alert-banner';
import { Button } from '@/components/button';
import { NewPasswordFields } from '@/components/passwords/new-password-fields';
import { TextField } from '@/components/text-field';
import { checkNewPassword, passwordErrorMessage, type NewPasswordErrors } from '@/components/passwords/password-fields';
import { colors, radii, space, type } from '@/constants/theme';

type Errors = NewPasswordErrors & { current?: string };

function endedText(n: number): string {
  if (n === 0) return 'Your password is changed. You had no other sessions open.';
  return `Your password is changed. ${n} other session${n === 1 ? ' was' : 's were'} signed out; this one stays.`;
}

export function ChangePasswordPanel() {
  const [current, setCurrent] = useState('');
  const [password, setPassword] = useState('');
  const [again, setAgain] = useState('');
  const [errors, setErrors] = useState<Errors>({});
  const change = useChangePasswordMutation();
  const submit = () => {
    if (change.isPending) return;
    const found: Errors = { ...checkNewPassword(password, again), current: current === '' ? 'Enter your current password' : undefined };
    setErrors(found);
    if (found.current || found.password || found.again) return;
    change.mutate({ currentPassword: current, newPassword: password }, {
      onSuccess: () => { setCurrent(''); setPassword(''); setAgain(''); },
    });
  };
  return (
    <View style={styles.block} testID="change-password-panel">
      <Text style={styles.title} role="heading" aria-level={2}>Change password</Text>
      <Text style={styles.body}>Your other sessions are signed out when the password changes; this one stays.</Text>
      {change.isError ? (
        <AlertBanner
          message={passwordErrorMessage(change.error, 'Changing the password failed. Try again in a moment.')} testID="change-password-error"
        />
      ) : null}
      {change.isSuccess ? (
        <View style={styles.note} role="status" testID="change-password-done">
          <Text style={styles.noteText}>{endedText(change.data.otherSessionsEnded)}</Text>
        </View>
      ) : null}
      <TextField
        label="Current password" testID="change-password-current" value={current} onChangeText={setCurrent}
        error={errors.current} secureTextEntry autoComplete="current-password"
      />
      <NewPasswordFields
        password={password} again={again} onChangePassword={setPassword} onChangeAgain={setAgain}
        passwordError={errors.password} againError={errors.again}
        passwordTestID="change-password-new" againTestID="change-password-again"
        passwordLabel={`New password (at least ${PASSWORD_MIN_CHARS} characters)`} againLabel="New password again"
        onSubmit={submit}
      />
      <View style={styles.buttons}>
        <Button label={change.isPending ? 'Changing…' : 'Change password'} testID="change-password-submit" onPress={submit} busy={change.isPending} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  block: { gap: space.md, marginTop: space.lg },
  title: { ...type.title, color: colors.abyss },
  body: { ...type.body, color: colors.ink },
  note: { backgroundColor: colors.primarySoft, borderRadius: radii.md, padding: space.md },
  noteText: { ...type.bodyStrong, color: colors.ink },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
