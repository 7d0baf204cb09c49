// Planned work with no notice open (seen on wide screens only; phones show the list).
import { DetailPlaceholder } from '@/components/inventory/detail-placeholder';
import { usePageTitle } from '@/components/page-title';

export default function NoticesIndexScreen() {
  usePageTitle('Planned work');
  return <DetailPlaceholder title="Pick a notice" hint="What moves, when, the effect on your slices, and the invitation for your calendar." />;
}
