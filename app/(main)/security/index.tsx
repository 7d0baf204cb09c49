// Security: one-time codes for sign-off decisions (operators), and your open sessions, with sign out everywhere.
import { useRouter } from 'expo-router';
import { useMeQuery } from '@/hooks/queries/me';
import { PageColumn } from '@/components/page-column';
import { OtpSection } from '@/components/security/otp-section';
import { SessionsPanel } from '@/components/security/sessions-panel';
import { isOperator } from '@/shared/permissions';

export default function SecurityScreen() {
  const router = useRouter();
  const me = useMeQuery();
  return (
    <PageColumn narrow>
      {me.data && isOperator(me.data.roles) ? <OtpSection /> : null}
      <SessionsPanel onSignedOutEverywhere={() => router.replace('/sign-in')} />
    </PageColumn>
  );
}
