// A new password and the same password again, as every form that sets one asks for it; the second submits the form.
import { TextField } from '@/components/text-field';

type Props = {
  password: string;
  again: string;
  onChangePassword: (text: string) => void;
  onChangeAgain: (text: string) => void;
  passwordError?: string;
  againError?: string;
  passwordTestID: string;
  againTestID: string;
  passwordLabel: string;
  againLabel: string;
  onSubmit: () => void;
};

export function NewPasswordFields(props: Props) {
  return (
    <>
      <TextField
        label={props.passwordLabel} testID={props.passwordTestID} value={props.password}
        onChangeText={props.onChangePassword} error={props.passwordError} secureTextEntry autoComplete="new-password"
      />
      <TextField
        label={props.againLabel} testID={props.againTestID} value={props.again} onChangeText={props.onChangeAgain}
        error={props.againError} secureTextEntry autoComplete="new-password" onSubmitEditing={props.onSubmit}
      />
    </>
  );
}
