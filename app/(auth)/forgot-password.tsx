// "Forgot your password?": ask for a one-time link to choose a new one.
import { Link } from 'expo-router';
import { Text } from 'react-native';
import { AuthFrame } from '@/components/auth-frame';
import { ForgotPasswordForm } from '@/components/passwords/forgot-password-form';
import { usePageTitle } from '@/components/page-title';

export default function ForgotPasswordScreen() {
  usePageTitle('Forgot your password?');
  return (
    <AuthFrame title="Forgot your password?">
      <ForgotPasswordForm />
      <Link href="/sign-in" testID="forgot-password-sign-in"><Text>Back to sign-in</Text></Link>
    </AuthFrame>
  );
}
