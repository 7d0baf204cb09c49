// A window's change-board pack: a printable document of the window, its accepted plan and the board's decisions.
import { useLocalSearchParams } from 'expo-router';
import { Linking } from 'react-native';
import { movesCsvUrl, useChangePackQuery } from '@/hooks/queries/change-pack';
import { ErrorState, LoadingState } from '@/components/screen-states';
import { useViewerTimeZone } from '@/components/time/use-viewer-time-zone';
import { ChangePackView } from '@/components/pack/change-pack-view';
import { titleWithName, usePageTitle } from '@/components/page-title';
import { staffWindowPage } from '@/components/notices/tenant-window-page';

function ChangePackScreen() {
  const timeZone = useViewerTimeZone();
  const { id } = useLocalSearchParams<{ id: string }>();
  const pack = useChangePackQuery(id);
  usePageTitle(titleWithName('Change-board pack', pack.data?.window.title));
  if (pack.isError && !pack.data) return <ErrorState message={pack.error.message} onRetry={() => void pack.refetch()} />;
  if (!pack.data) return <LoadingState label="Putting the pack together…" />;
  return <ChangePackView pack={pack.data} timeZone={timeZone} onDownloadMoves={() => void Linking.openURL(movesCsvUrl(id))} />;
}

// Tenant users get their own view of a window's address (see staffWindowPage).
export default staffWindowPage(ChangePackScreen);
