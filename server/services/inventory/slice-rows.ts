// Slices: list rows (tenant, service type, priority, totals, current revision) with their filters.
import type { SliceList, SliceListQuery, SliceRow } from '../../../shared/inventory';
import type { ScenarioSlice } from '../../../shared/scenario';
import { memoised, type InventoryView } from './inventory-view';
import { indexRows, pageIndexed, type IndexedRows } from './paging';

const sum = (xs: readonly number[]) => xs.reduce((a, b) => a + b, 0);

/** Row builder with the per-request look-ups (tenant names, status, current revision) made once. */
function sliceRowBuilder(view: InventoryView): (slice: ScenarioSlice) => SliceRow {
  const tenantNames = new Map(view.scenario.tenants.map((t) => [t.id, t.name]));
  const { status, revision } = view.sliceFacts;
  return (slice) => ({
    id: slice.id,
    name: slice.name,
    tenantId: slice.tenant,
    tenantName: tenantNames.get(slice.tenant) ?? slice.tenant,
    sst: slice.sst,
    sd: slice.sd ?? null,
    priority: slice.priority,
    critical: slice.critical ?? false,
    status: status.get(slice.id) ?? 'active',
    functionCount: slice.functions.length,
    tieCount: slice.ties.length,
    cpu: sum(slice.functions.map((f) => f.cpu)),
    bandwidthGbps: sum(slice.ties.map((t) => t.bandwidthGbps)),
    revision: revision.get(slice.id) ?? null,
  });
}

function matchesFilters(row: SliceRow, query: SliceListQuery): boolean {
  if (query.tenant !== undefined && row.tenantId !== query.tenant) return false;
  if (query.sst !== undefined && row.sst !== query.sst) return false;
  if (query.priority !== undefined && row.priority !== query.priority) return false;
  if (query.critical !== undefined && row.critical !== query.critical) return false;
  return true;
}

/** Every slice row of the view in the view's order, built once per view. */
export function sliceTable(view: InventoryView): IndexedRows<SliceRow> {
  return memoised(view, 'slice-rows', () =>
    indexRows(view.slices.map(sliceRowBuilder(view)), (row) => `${row.id} ${row.name} ${row.tenantName}`));
}

export function listSlices(view: InventoryView, query: SliceListQuery): SliceList {
  return pageIndexed(
    sliceTable(view), query,
    (row, key) => (key === 'tenant' ? row.tenantName : row[key]),
    (row) => matchesFilters(row, query),
  );
}
