// The network as stored right now, compiled for the planner without the server's inventory cache, for tests that
// write rows and read them back at once.
import type { Queryable } from '../../../db/client';
import { buildInventory } from '../../../planner/model/build-inventory';
import type { Inventory } from '../../../planner/model/types';
import { loadNetworkScenario } from '../../../server/services/inventory/load-network-scenario';
import type { Scenario } from '../../../shared/scenario';

/** The scenario and its planner compilation (throws the planner's errors on dangling references). */
export async function loadInventory(db: Queryable): Promise<{ scenario: Scenario; inventory: Inventory }> {
  const scenario = await loadNetworkScenario(db);
  return { scenario, inventory: buildInventory(scenario) };
}
