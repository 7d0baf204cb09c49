// First admin of an instance started without the demo: opened from the one-time link printed at start.
import { useLocalSearchParams, useRouter } from 'expo-router';
import { useSetUpLinkQuery } from '@/hooks/queries/setup';
import { isApiError } from '@/hooks/api-fetch';
import { AuthFrame, AuthLink } from '@/components/auth-frame';
import { SetUpForm } from '@/components/setup/set-up-form';
import { ErrorState, LoadingState } from '@/components/screen-states';
import { usePageTitle } from '@/components/page-title';

const LINK_GONE = 'This set-up link does not work any more: it was used already, it expired (links last 24 hours) or it was copied only in part. Restart the server to print a new one, or sign in if the admin exists.';

const NO_TOKEN = 'Open the set-up link exactly as the server printed it: this address has no token.';

export default function SetUpScreen() {
  const { token = '' } = useLocalSearchParams<{ token?: string }>();
  const router = useRouter();
  const link = useSetUpLinkQuery(token);
  usePageTitle('Set up Slackwater');
  let body;
  if (token === '' || link.isError) {
    body = (
      <>
        <ErrorState message={token === '' ? NO_TOKEN : isApiError(link.error) && link.error.status === 404 ? LINK_GONE : link.error?.message ?? LINK_GONE} />
        <AuthLink href="/sign-in" testID="set-up-sign-in">Go to sign-in</AuthLink>
      </>
    );
  } else if (!link.data) body = <LoadingState label="Checking the set-up link…" />;
  else body = <SetUpForm token={token} onDone={() => router.replace('/')} />;
  return <AuthFrame title="Set up Slackwater">{body}</AuthFrame>;
}
