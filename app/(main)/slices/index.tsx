// Slices with nothing selected (seen on wide screens only; phones show the list).
import { DetailPlaceholder } from '@/components/inventory/detail-placeholder';
import { usePageTitle } from '@/components/page-title';

export default function SlicesIndexScreen() {
  usePageTitle('Slices');
  return <DetailPlaceholder title="Pick a slice" hint="Its functions, ties, current placement and history show here." />;
}
