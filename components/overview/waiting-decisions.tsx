// Overview, approvers only: how many windows wait for their sign-off decision, one tap from the queue.
// Shows nothing when none wait or the viewer is not an approver.
import { canSignOff } from '@/shared/permissions';
import { useMeQuery } from '@/hooks/queries/me';
import { useSignoffWaitingCountQuery } from '@/hooks/queries/signoff';
import { ActionPanel } from './action-panel';

export const waitingSentence = (n: number) => `${n} decision${n === 1 ? ' waits' : 's wait'} for you`;

export function WaitingDecisions() {
  const approver = canSignOff(useMeQuery().data?.roles ?? []);
  const waiting = useSignoffWaitingCountQuery(approver).data?.waiting ?? 0;
  if (!approver || waiting === 0) return null;
  return (
    <ActionPanel testID="overview-waiting-decisions" lead={waitingSentence(waiting)}
      body="Windows in review that need your approval or send-back before tenants can be told."
      href="/sign-off" action="Open the sign-off queue" />
  );
}
