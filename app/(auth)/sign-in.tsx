// Sign-in screen: the form, a way in for a forgotten password, and where to go once it succeeds.
import { useLocalSearchParams, useRouter } from 'expo-router';
import { Text } from 'react-native';
import { AuthFrame, AuthLink } from '@/components/auth-frame';
import { SignInForm } from '@/components/sign-in-form';
import { SsoSignInSection } from '@/components/sso/sso-sign-in-section';
import { usePageTitle } from '@/components/page-title';

export default function SignInScreen() {
  const router = useRouter();
  const { reset } = useLocalSearchParams<{ reset?: string }>();
  usePageTitle('Sign in');
  return (
    <AuthFrame title="Sign in">
      {reset === 'done' ? <Text role="status" testID="sign-in-password-reset">Your new password is saved. Sign in with it.</Text> : null}
      <SsoSignInSection />
      <SignInForm onSignedIn={() => router.replace('/')} />
      <AuthLink href="/forgot-password" testID="sign-in-forgot-password">Forgot your password?</AuthLink>
    </AuthFrame>
  );
}
