// Network area: the sites/spans lists beside (wide) or before (phone) the selected site's or span's detail.
import { Slot, usePathname } from 'expo-router';
import { SplitView } from '@/components/inventory/split-view';
import { NetworkLists } from '@/components/inventory/network-lists';

export default function NetworkLayout() {
  const pathname = usePathname();
  return <SplitView list={<NetworkLists />} detail={<Slot />} showDetail={pathname !== '/network'} />;
}
