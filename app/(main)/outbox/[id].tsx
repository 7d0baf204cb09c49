// One received message, from GET /api/outbox/:id.
import { useLocalSearchParams } from 'expo-router';
import { useOutboxMessageQuery } from '@/hooks/queries/outbox';
import { ErrorState, LoadingState } from '@/components/screen-states';
import { OutboxMessageView } from '@/components/outbox/outbox-message-view';
import { titleWithName, usePageTitle } from '@/components/page-title';

export default function OutboxMessageScreen() {
  const { id = '' } = useLocalSearchParams<{ id: string }>();
  const message = useOutboxMessageQuery(Number(id));
  usePageTitle(titleWithName('Message', message.data ? message.data.subject ?? '(no subject)' : null));
  if (message.isError) return <ErrorState message={message.error.message} onRetry={() => void message.refetch()} />;
  if (!/^\d+$/.test(id)) return <ErrorState message={`"${id}" is not a message number.`} />;
  if (!message.data) return <LoadingState label="Loading the message…" />;
  return <OutboxMessageView message={message.data} />;
}
