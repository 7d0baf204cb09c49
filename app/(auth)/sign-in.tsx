// Sign-in screen: the form, and where to go once it succeeds.
import { useRouter } from 'expo-router';
import { AuthFrame } from '@/components/auth-frame';
import { SignInForm } from '@/components/sign-in-form';

export default function SignInScreen() {
  const router = useRouter();
  return (
    <AuthFrame title="Sign in">
      <SignInForm onSignedIn={() => router.replace('/')} />
    </AuthFrame>
  );
}
