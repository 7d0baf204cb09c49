// Slices area: the slices list beside (wide) or before (phone) the selected slice's detail.
import { Slot, usePathname } from 'expo-router';
import { SplitView } from '@/components/inventory/split-view';
import { SliceLists } from '@/components/inventory/slice-lists';

export default function SlicesLayout() {
  const pathname = usePathname();
  return <SplitView list={<SliceLists />} detail={<Slot />} showDetail={pathname !== '/slices'} />;
}
