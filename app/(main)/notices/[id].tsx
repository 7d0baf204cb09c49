// One notice for the tenant: its content, the acknowledgement and the .ics download.
import { useLocalSearchParams } from 'expo-router';
import { noticeIcsPath, useAcknowledgeNoticeMutation, useNoticeQuery } from '@/hooks/queries/notices';
import { ErrorState, LoadingState } from '@/components/screen-states';
import { NoticeView } from '@/components/notices/notice-view';
import { titleWithName, usePageTitle } from '@/components/page-title';

export default function NoticeScreen() {
  const { id = '' } = useLocalSearchParams<{ id: string }>();
  const notice = useNoticeQuery(id);
  const acknowledge = useAcknowledgeNoticeMutation(id);
  usePageTitle(titleWithName('Notice', notice.data?.notice.content.summary));
  if (notice.isError) return <ErrorState message={notice.error.message} onRetry={() => void notice.refetch()} />;
  if (!notice.data) return <LoadingState label="Loading the notice…" />;
  return (
    <NoticeView
      notice={notice.data.notice}
      icsHref={noticeIcsPath(id)}
      onAcknowledge={() => acknowledge.mutate()}
      acknowledging={acknowledge.isPending}
      error={acknowledge.error?.message ?? null}
    />
  );
}
