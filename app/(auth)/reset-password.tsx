// Opened from the reset link in the mail: check the link, then choose a new password and sign in with it.
import { useLocalSearchParams, useRouter } from 'expo-router';
import { useResetLinkQuery } from '@/hooks/queries/passwords';
import { isApiError } from '@/hooks/api-fetch';
import { AuthFrame, AuthLink } from '@/components/auth-frame';
import { ResetPasswordForm } from '@/components/passwords/reset-password-form';
import { ErrorState, LoadingState } from '@/components/screen-states';
import { usePageTitle } from '@/components/page-title';

const LINK_GONE = 'This reset link does not work any more: it was used already, it expired (links last 60 minutes), a newer link replaced it, or it was copied only in part. Ask for a new one.';
const NO_TOKEN = 'Open the reset link exactly as the mail gave it: this address has no token.';

export default function ResetPasswordScreen() {
  const { token = '' } = useLocalSearchParams<{ token?: string }>();
  const router = useRouter();
  const link = useResetLinkQuery(token);
  usePageTitle('Choose a new password');
  let body;
  if (token === '' || link.isError) {
    body = (
      <>
        <ErrorState message={token === '' ? NO_TOKEN : isApiError(link.error) && link.error.status === 404 ? LINK_GONE : link.error?.message ?? LINK_GONE} />
        <AuthLink href="/forgot-password" testID="reset-password-ask-again">Ask for a new link</AuthLink>
      </>
    );
  } else if (!link.data) body = <LoadingState label="Checking the reset link…" />;
  else body = <ResetPasswordForm token={token} onDone={() => router.replace({ pathname: '/sign-in', params: { reset: 'done' } })} />;
  return <AuthFrame title="Choose a new password">{body}</AuthFrame>;
}
