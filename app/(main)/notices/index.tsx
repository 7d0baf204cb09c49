// Planned work with no notice open (seen on wide screens only; phones show the list).
import { DetailPlaceholder } from '@/components/inventory/detail-placeholder';

export default function NoticesIndexScreen() {
  return <DetailPlaceholder title="Pick a notice" hint="What moves, when, the effect on your slices, and the invitation for your calendar." />;
}
