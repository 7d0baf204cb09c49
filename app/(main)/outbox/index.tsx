// Outbox with no message open (seen on wide screens only; phones show the list).
import { DetailPlaceholder } from '@/components/inventory/detail-placeholder';
import { usePageTitle } from '@/components/page-title';

export default function OutboxIndexScreen() {
  usePageTitle('Outbox');
  return <DetailPlaceholder title="Pick a message" hint="Its headers, text, attachments and calendar invitation show here." />;
}
