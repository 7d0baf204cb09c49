// Tenant portal: upcoming work on the tenant's slices beside (wide) or before (phone) the open notice.
import { Slot, usePathname, useRouter } from 'expo-router';
import { usePortalWorkQuery } from '@/hooks/queries/notices';
import { EmptyState, ErrorState, LoadingState } from '@/components/screen-states';
import { SplitView } from '@/components/inventory/split-view';
import { noticeIdFromPath, PortalWorkList, PortalWorkPane } from '@/components/notices/portal-work-pane';

export default function NoticesLayout() {
  const pathname = usePathname();
  const router = useRouter();
  const work = usePortalWorkQuery();
  const selectedId = noticeIdFromPath(pathname);

  let list;
  if (work.isError) list = <ErrorState message={work.error.message} onRetry={() => void work.refetch()} />;
  else if (!work.data) list = <LoadingState label="Loading planned work…" />;
  else if (work.data.items.length === 0) {
    list = <EmptyState title="No planned work on your slices" hint="When maintenance touches one of your slices, it shows here with our notice." />;
  } else {
    list = <PortalWorkList work={work.data} selectedId={selectedId}
      onOpen={(id) => router.push({ pathname: '/notices/[id]', params: { id } })} />;
  }
  return <SplitView list={<PortalWorkPane>{list}</PortalWorkPane>} detail={<Slot />} showDetail={selectedId !== null} />;
}
