// One window's sign-off: the phone-sized summary, the decision, and the decisions so far. The unsent decision is
// kept per user and window (DecisionDraftScope) and forgotten once recorded.
import { useLocalSearchParams, useRouter, type Href } from 'expo-router';
import { useMeQuery } from '@/hooks/queries/me';
import { useOtpStatusQuery, useSignoffDecisionMutation, useSignoffSummaryQuery } from '@/hooks/queries/signoff';
import { ErrorState, LoadingState } from '@/components/screen-states';
import { decisionDraftKey, DecisionDraftScope, forgetDecisionDraft } from '@/components/signoff/decision-draft';
import { SignoffSummaryView } from '@/components/signoff/signoff-summary-view';
import { useViewerTimeZone } from '@/components/time/use-viewer-time-zone';
import { titleWithName, usePageTitle } from '@/components/page-title';

export default function SignoffWindowScreen() {
  const { windowId } = useLocalSearchParams<{ windowId: string }>();
  const router = useRouter();
  const timeZone = useViewerTimeZone();
  const draftKey = decisionDraftKey(useMeQuery().data?.id ?? 'signed-out', windowId);
  const summary = useSignoffSummaryQuery(windowId);
  const decision = useSignoffDecisionMutation(windowId);
  const otp = useOtpStatusQuery();
  usePageTitle(titleWithName('Sign-off', summary.data?.window.title));
  if (summary.isError && !summary.data) return <ErrorState message={summary.error.message} onRetry={() => void summary.refetch()} />;
  if (!summary.data) return <LoadingState label="Loading the plan summary…" />;
  return (
    <DecisionDraftScope draftKey={draftKey}>
      <SignoffSummaryView
        summary={summary.data}
        timeZone={timeZone}
        codeEnrolled={otp.data?.enrolled ?? false}
        deciding={decision.isPending}
        decisionError={decision.error}
        onDecide={(body) => decision.mutate(body, { onSuccess: () => forgetDecisionDraft(draftKey) })}
        onOpenPlan={(href) => router.push(href as Href)}
        onOpenPack={() => router.push(`/windows/${encodeURIComponent(windowId)}/pack`)}
        // Codes are set up inside the decision form now; nothing leaves this screen for them.
        onEnrol={() => undefined}
      />
    </DecisionDraftScope>
  );
}
