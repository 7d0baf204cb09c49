// A view of the inventory: the data of one revision, what the asker may see of it, and the load it puts on the network.
import { buildInventory } from '../../../planner/model/build-inventory';
import type { Inventory } from '../../../planner/model/types';
import { placementLoad } from '../../../planner/model/window-capacity';
import type { Scenario, ScenarioSite, ScenarioSlice, ScenarioSpan } from '../../../shared/scenario';
import { selectScenarioTables, type ScenarioTables } from '../../queries/inventory/scenario-tables';
import type { Queryable } from '../../../db/client';
import { tablesToScenario } from './load-network-scenario';
import { buildUseIndex, type UseIndex } from './slice-uses';

export interface InventoryView {
  /** null = network-wide; otherwise the one tenant in view */
  tenantId: string | null;
  scenario: Scenario;
  inventory: Inventory;
  /** what the scenario format does not carry: each slice's status and current placement revision */
  sliceFacts: SliceFacts;
  /** what the asker may see: every element for staff, the tenant's footprint for a tenant user */
  sites: ScenarioSite[];
  spans: ScenarioSpan[];
  slices: ScenarioSlice[];
  siteById: Map<string, ScenarioSite>;
  spanById: Map<string, ScenarioSpan>;
  /** vCPU and Gbit/s used by the slices in view (so a tenant never sees others' load) */
  cpuUsed: Map<string, number>;
  gbpsUsed: Map<string, number>;
  uses: UseIndex;
  /** derived data kept with the view (list rows, sort orders), see memoised() */
  memo: Map<string, unknown>;
}

/** The tenant's footprint: sites hosting its functions or at either end of a span its ties cross; those spans. */
function footprint(slices: readonly ScenarioSlice[], scenario: Scenario): { sites: Set<string>; spans: Set<string> } {
  const mine = new Set(slices.map((s) => s.id));
  const sites = new Set<string>();
  const spans = new Set<string>();
  for (const p of scenario.placements) {
    if (!mine.has(p.slice)) continue;
    for (const site of Object.values(p.sites)) sites.add(site);
    for (const path of Object.values(p.paths)) for (const span of path) spans.add(span);
  }
  for (const span of scenario.spans) {
    if (spans.has(span.id)) { sites.add(span.a); sites.add(span.b); }
  }
  return { sites, spans };
}

function loadsOf(inventory: Inventory, slices: readonly ScenarioSlice[]) {
  const indices = slices.map((s) => inventory.sliceIndex.get(s.id)!);
  const load = placementLoad(inventory, indices);
  const cpuUsed = new Map(inventory.network.sites.map((s) => [s.id, load.siteCpu[s.index]]));
  const gbpsUsed = new Map(inventory.network.spans.map((s) => [s.id, load.spanGbps[s.index]]));
  return { cpuUsed, gbpsUsed };
}

export interface SliceFacts {
  status: Map<string, string>;
  revision: Map<string, number>;
}

/** One revision's inventory as read and compiled: the base every view of that revision shares. */
export interface CompiledInventory {
  scenario: Scenario;
  inventory: Inventory;
  sliceFacts: SliceFacts;
}

/** The row data the lists need beyond the scenario; the rows themselves are not kept (they would double the memory). */
export function sliceFactsOf(tables: ScenarioTables): SliceFacts {
  return {
    status: new Map(tables.sliceRows.map((s) => [s.id, s.status])),
    revision: new Map(tables.placementRows.map((p) => [p.sliceId, p.revision])),
  };
}

export function compileInventory(tables: ScenarioTables): CompiledInventory {
  const scenario = tablesToScenario(tables);
  return { scenario, inventory: buildInventory(scenario), sliceFacts: sliceFactsOf(tables) };
}

/** What one asker may see of a compiled inventory (null = network-wide), with its loads and use index. */
export function viewOf(compiled: CompiledInventory, tenantId: string | null): InventoryView {
  const { scenario, inventory, sliceFacts } = compiled;
  const slices = tenantId === null ? scenario.slices : scenario.slices.filter((s) => s.tenant === tenantId);
  let sites = scenario.sites;
  let spans = scenario.spans;
  if (tenantId !== null) {
    const seen = footprint(slices, scenario);
    sites = sites.filter((s) => seen.sites.has(s.id));
    spans = spans.filter((s) => seen.spans.has(s.id));
  }
  return {
    tenantId, scenario, inventory, sliceFacts, sites, spans, slices,
    siteById: new Map(sites.map((s) => [s.id, s])),
    spanById: new Map(spans.map((s) => [s.id, s])),
    ...loadsOf(inventory, slices),
    uses: buildUseIndex(scenario, slices),
    memo: new Map(),
  };
}

/** Reads and compiles the inventory without any cache (inside a transaction, or for a one-off read). */
export async function loadInventoryView(db: Queryable, tenantId: string | null): Promise<InventoryView> {
  return viewOf(compileInventory(await selectScenarioTables(db)), tenantId);
}

/** What `build` returns for this view, computed once per view (a view lives as long as its revision). */
export function memoised<T>(view: InventoryView, key: string, build: () => T): T {
  if (!view.memo.has(key)) view.memo.set(key, build());
  return view.memo.get(key) as T;
}

/** used ÷ capacity, 0 for an element without capacity (never NaN or Infinity on the wire). */
export function ratioOf(used: number, capacity: number): number {
  return capacity > 0 ? used / capacity : 0;
}
