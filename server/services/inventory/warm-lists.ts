// Prepares a new revision's network-wide lists (rows, search text, default order) and map before readers arrive,
// so the first list request after a write does not pay for them.
import {
  siteListQuerySchema, sliceListQuerySchema, spanListQuerySchema, tenantListQuerySchema,
} from '../../../shared/inventory';
import type { InventoryView } from './inventory-view';
import { getNetworkMap } from './network-map';
import { listSites } from './site-rows';
import { listSlices } from './slice-rows';
import { listSpans } from './span-rows';
import { listTenants } from './tenant-rows';

/** Lets requests waiting on the event loop run between two long steps of a build. */
export const yieldToLoop = () => new Promise<void>((resolve) => setImmediate(resolve));

export async function warmLists(view: InventoryView): Promise<void> {
  const steps = [
    () => listSlices(view, sliceListQuerySchema.parse({})),
    () => listSites(view, siteListQuerySchema.parse({})),
    () => listSpans(view, spanListQuerySchema.parse({})),
    () => listTenants(view, tenantListQuerySchema.parse({})),
    () => getNetworkMap(view),
  ];
  for (const step of steps) {
    step();
    await yieldToLoop();
  }
}
