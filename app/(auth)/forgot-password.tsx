// "Forgot your password?": ask for a one-time link to choose a new one.

import { AuthFrame, AuthLink } from '@/components/auth-frame';
import { ForgotPasswordForm } from '@/components/passwords/forgot-password-form';
import { usePageTitle } from '@/components/page-title';

export default function ForgotPasswordScreen() {
  usePageTitle('Forgot your password?');
  return (
    <AuthFrame title="Forgot your password?">
      <ForgotPasswordForm />
      <AuthLink href="/sign-in" testID="forgot-password-sign-in">Back to sign-in</AuthLink>
    </AuthFrame>
  );
}
