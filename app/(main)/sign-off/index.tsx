// Sign-off queue (approvers; admins read it too): windows in review, soonest first, then what I decided already.
import { useRouter } from 'expo-router';
import { useMeQuery } from '@/hooks/queries/me';
import { canAdminister, canOpenSignoffQueue, canSignOff } from '@/shared/permissions';
import { useDecidedByMeQuery, useSignoffQueueQuery } from '@/hooks/queries/signoff';
import { EmptyState, ErrorState, LoadingState } from '@/components/screen-states';
import { DecidedByMe } from '@/components/signoff/decided-by-me';
import { QueueFooter } from '@/components/signoff/queue-footer';
import { SignoffQueueList } from '@/components/signoff/signoff-queue-list';
import { useViewerTimeZone } from '@/components/time/use-viewer-time-zone';
import { usePageTitle } from '@/components/page-title';

export default function SignoffQueueScreen() {
  const router = useRouter();
  const timeZone = useViewerTimeZone();
  const roles = useMeQuery().data?.roles ?? [];
  const allowed = canOpenSignoffQueue(roles);
  const queue = useSignoffQueueQuery(allowed);
  const decided = useDecidedByMeQuery(canSignOff(roles));
  usePageTitle('Sign-off');
  if (!allowed) return <EmptyState page title="Sign-off is for the change board" hint="Approvers decide on move plans here." />;
  if (queue.isError) return <ErrorState message={queue.error.message} onRetry={() => void queue.refetch()} />;
  if (!queue.data) return <LoadingState label="Loading the sign-off queue…" />;
  const open = (id: string) => router.push(`/sign-off/${encodeURIComponent(id)}`);
  const footer = (
    <>
      {decided.data ? <DecidedByMe items={decided.data.decisions} timeZone={timeZone} onOpen={open} /> : null}
      <QueueFooter isAdmin={canAdminister(roles)} onOpenCodes={() => router.push('/security')} onOpenPolicy={() => router.push('/sign-off/policy')} />
    </>
  );
  return <SignoffQueueList items={queue.data.windows} timeZone={timeZone} onOpen={open} footer={footer} />;
}
