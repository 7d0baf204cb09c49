// An invitation opened from its e-mail: check the link, then let the invitee choose a password (and be signed in).
import { useLocalSearchParams, useRouter } from 'expo-router';
import { useInvitationLinkQuery } from '@/hooks/queries/people';
import { isApiError } from '@/hooks/api-fetch';
import { AuthFrame, AuthLink } from '@/components/auth-frame';
import { InvitationForm } from '@/components/people/invitation-form';
import { SsoSignInSection } from '@/components/sso/sso-sign-in-section';
import { ErrorState, LoadingState } from '@/components/screen-states';
import { usePageTitle } from '@/components/page-title';

const LINK_GONE = 'This invitation link does not work any more: it was used already, it expired (links last 72 hours), a newer one was sent, or it was copied only in part. Ask the admin who invited you to send it again.';
const NO_TOKEN = 'Open the link exactly as the invitation e-mail shows it: this address has no token.';

export default function InvitationScreen() {
  const { token = '' } = useLocalSearchParams<{ token?: string }>();
  const router = useRouter();
  const link = useInvitationLinkQuery(token);
  usePageTitle('Accept your invitation');
  let body;
  if (token === '' || link.isError) {
    const message = token === '' ? NO_TOKEN : isApiError(link.error) && link.error.status === 404 ? LINK_GONE : link.error?.message ?? LINK_GONE;
    body = (
      <>
        <ErrorState message={message} />
        <AuthLink href="/sign-in" testID="invitation-sign-in">Go to sign-in</AuthLink>
      </>
    );
  } else if (!link.data) body = <LoadingState label="Checking the invitation link…" />;
  // Staff may use the company's sign-on instead (it shows only when an admin set it up); the issuer's verified
  // e-mail links the invited account and ends its invitation.
  else {
    const sso = link.data.staff ? <SsoSignInSection orText="or choose a password for Slackwater below" /> : undefined;
    body = <InvitationForm token={token} invitee={link.data} onDone={() => router.replace('/')} singleSignOn={sso} />;
  }
  return <AuthFrame title="Accept your invitation">{body}</AuthFrame>;
}
