// One window's sign-off: the phone-sized summary, the decision, and the decisions so far.
import { useLocalSearchParams, useRouter, type Href } from 'expo-router';
import { useOtpStatusQuery, useSignoffDecisionMutation, useSignoffSummaryQuery } from '@/hooks/queries/signoff';
import { ErrorState, LoadingState } from '@/components/screen-states';
import { SignoffSummaryView } from '@/components/signoff/signoff-summary-view';
import { useViewerTimeZone } from '@/components/time/use-viewer-time-zone';

export default function SignoffWindowScreen() {
  const timeZone = useViewerTimeZone();
  const { windowId } = useLocalSearchParams<{ windowId: string }>();
  const router = useRouter();
  const summary = useSignoffSummaryQuery(windowId);
  const decision = useSignoffDecisionMutation(windowId);
  const otp = useOtpStatusQuery();
  if (summary.isError && !summary.data) return <ErrorState message={summary.error.message} onRetry={() => void summary.refetch()} />;
  if (!summary.data) return <LoadingState label="Loading the plan summary…" />;
  return (
    <SignoffSummaryView
      summary={summary.data}
      timeZone={timeZone}
      codeEnrolled={otp.data?.enrolled ?? false}
      deciding={decision.isPending}
      decisionError={decision.error}
      onDecide={(body) => decision.mutate(body)}
      onOpenPlan={(href) => router.push(href as Href)}
      onEnrol={() => router.push('/security')}
    />
  );
}
