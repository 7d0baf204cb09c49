// Sign-in screen: the form, and where to go once it succeeds.
import { useRouter } from 'expo-router';
import { AuthFrame } from '@/components/auth-frame';
import { SignInForm } from '@/components/sign-in-form';
import { usePageTitle } from '@/components/page-title';

export default function SignInScreen() {
  const router = useRouter();
  usePageTitle('Sign in');
  return (
    <AuthFrame title="Sign in">
      <SignInForm onSignedIn={() => router.replace('/')} />
    </AuthFrame>
  );
}
