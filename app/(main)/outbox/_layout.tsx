// Outbox area (admin): the list of received mail beside (wide) or before (phone) the open message.
import { Slot, usePathname, useRouter } from 'expo-router';
import { useOutboxListQuery } from '@/hooks/queries/outbox';
import { EmptyState, ErrorState, LoadingState } from '@/components/screen-states';
import { SplitView } from '@/components/inventory/split-view';
import { OutboxList } from '@/components/outbox/outbox-list';
import { OutboxPane, outboxIdFromPath } from '@/components/outbox/outbox-pane';
import { useViewerTimeZone } from '@/components/time/use-viewer-time-zone';

export default function OutboxLayout() {
  const timeZone = useViewerTimeZone();
  const pathname = usePathname();
  const router = useRouter();
  const outbox = useOutboxListQuery();
  const selectedId = outboxIdFromPath(pathname);
  const messages = outbox.data?.pages.flatMap((page) => page.items) ?? [];
  const total = outbox.data?.pages[0]?.total ?? 0;

  let list;
  if (outbox.isError) list = <ErrorState message={outbox.error.message} onRetry={() => void outbox.refetch()} />;
  else if (!outbox.data) list = <LoadingState label="Loading the outbox…" />;
  else if (total === 0) {
    list = (
      <EmptyState
        title="No mail yet — nothing has been sent"
        hint="Sign-off requests and tenant notices show up here as soon as the server sends them. With SMTP_URL set to a real mail server, mail goes there instead and this list stays empty."
      />
    );
  } else {
    list = (
      <OutboxList
        messages={messages}
        total={total}
        selectedId={selectedId}
        viewerZone={timeZone}
        onOpen={(id) => router.push({ pathname: '/outbox/[id]', params: { id: String(id) } })}
        hasMore={outbox.hasNextPage}
        loadingMore={outbox.isFetchingNextPage}
        onLoadMore={() => void outbox.fetchNextPage()}
      />
    );
  }
  return <SplitView list={<OutboxPane>{list}</OutboxPane>} detail={<Slot />} showDetail={selectedId !== null} />;
}
