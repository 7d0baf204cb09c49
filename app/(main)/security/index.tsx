// Security: your time zone, your calendar subscription, one-time codes for sign-off decisions (operators), your
// password, and your open sessions, with sign out everywhere.
import { useRouter } from 'expo-router';
import { useMeQuery } from '@/hooks/queries/me';
import { PageColumn } from '@/components/page-column';
import { CalendarFeedPanel } from '@/components/security/calendar-feed-panel';
import { ChangePasswordPanel } from '@/components/security/change-password-panel';
import { OtpSection } from '@/components/security/otp-section';
import { SessionsPanel } from '@/components/security/sessions-panel';
import { TimeZoneSection } from '@/components/security/time-zone-section';
import { useViewerTimeZone } from '@/components/time/use-viewer-time-zone';
import { isOperator } from '@/shared/permissions';
import { PageHeading, usePageTitle } from '@/components/page-title';

export default function SecurityScreen() {
  const router = useRouter();
  const me = useMeQuery();
  const timeZone = useViewerTimeZone();
  usePageTitle('Security');
  return (
    <PageColumn narrow>
      <PageHeading>Security</PageHeading>
      <TimeZoneSection />
      <CalendarFeedPanel />
      {me.data && isOperator(me.data.roles) ? <OtpSection /> : null}
      <ChangePasswordPanel />
      <SessionsPanel timeZone={timeZone} onSignedOutEverywhere={() => router.replace('/sign-in')} />
    </PageColumn>
  );
}
