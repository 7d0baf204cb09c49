// Network with nothing selected: on wide screens the detail pane shows the whole network as a map.
import { InventoryMapPane } from '@/components/inventory/inventory-map-pane';
import { usePageTitle } from '@/components/page-title';

export default function NetworkIndexScreen() {
  usePageTitle('Network');
  return <InventoryMapPane />;
}
