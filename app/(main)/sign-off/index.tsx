// Sign-off queue (approvers; admins read it too): windows in review, soonest first.
import { useRouter } from 'expo-router';
import { useMeQuery } from '@/hooks/queries/me';
import { canAdminister, canOpenSignoffQueue } from '@/shared/permissions';
import { useSignoffQueueQuery } from '@/hooks/queries/signoff';
import { EmptyState, ErrorState, LoadingState } from '@/components/screen-states';
import { QueueFooter } from '@/components/signoff/queue-footer';
import { SignoffQueueList } from '@/components/signoff/signoff-queue-list';
import { useViewerTimeZone } from '@/components/time/use-viewer-time-zone';

export default function SignoffQueueScreen() {
  const timeZone = useViewerTimeZone();
  const router = useRouter();
  const roles = useMeQuery().data?.roles ?? [];
  const allowed = canOpenSignoffQueue(roles);
  const queue = useSignoffQueueQuery(allowed);
  if (!allowed) return <EmptyState title="Sign-off is for the change board" hint="Approvers decide on move plans here." />;
  if (queue.isError) return <ErrorState message={queue.error.message} onRetry={() => void queue.refetch()} />;
  if (!queue.data) return <LoadingState label="Loading the sign-off queue…" />;
  const footer = <QueueFooter isAdmin={canAdminister(roles)} onOpenCodes={() => router.push('/security')} onOpenPolicy={() => router.push('/sign-off/policy')} />;
  if (queue.data.windows.length === 0) {
    return (
      <>
        <EmptyState title="Nothing to sign off" hint="Windows appear here when a planner submits an accepted plan." />
        {footer}
      </>
    );
  }
  return <SignoffQueueList items={queue.data.windows} timeZone={timeZone} onOpen={(id) => router.push(`/sign-off/${encodeURIComponent(id)}`)} footer={footer} />;
}
