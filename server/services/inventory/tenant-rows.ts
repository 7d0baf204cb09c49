// Tenants: list rows with slice counts, and the detail with contacts and slices.
import type { TenantDetail, TenantList, TenantListQuery, TenantRow } from '../../../shared/inventory';
import type { ScenarioTenant } from '../../../shared/scenario';
import { InventoryNotFoundError } from './errors';
import { memoised, type InventoryView } from './inventory-view';
import { indexRows, pageIndexed } from './paging';
import { sliceTable } from './slice-rows';

function visibleTenants(view: InventoryView): ScenarioTenant[] {
  return view.tenantId === null ? view.scenario.tenants : view.scenario.tenants.filter((t) => t.id === view.tenantId);
}

function tenantRowBuilder(view: InventoryView): (t: ScenarioTenant) => TenantRow {
  return memoised(view, 'tenant-row', () => tenantRowOf(view));
}

function tenantRowOf(view: InventoryView): (t: ScenarioTenant) => TenantRow {
  const counts = new Map<string, { all: number; critical: number }>();
  for (const s of view.slices) {
    const c = counts.get(s.tenant) ?? { all: 0, critical: 0 };
    c.all += 1;
    if (s.critical) c.critical += 1;
    counts.set(s.tenant, c);
  }
  return (t) => ({
    id: t.id, name: t.name, noticeDays: t.noticeDays, contactCount: t.contacts?.length ?? 0,
    sliceCount: counts.get(t.id)?.all ?? 0, criticalSliceCount: counts.get(t.id)?.critical ?? 0,
  });
}

export function listTenants(view: InventoryView, query: TenantListQuery): TenantList {
  const table = memoised(view, 'tenant-rows', () =>
    indexRows(visibleTenants(view).map(tenantRowBuilder(view)), (row) => `${row.id} ${row.name}`));
  return pageIndexed(table, query, (row, key) => row[key]);
}

export function getTenantDetail(view: InventoryView, id: string): TenantDetail {
  const tenant = visibleTenants(view).find((t) => t.id === id);
  if (!tenant) throw new InventoryNotFoundError('tenant', id);
  return {
    tenant: tenantRowBuilder(view)(tenant),
    contacts: tenant.contacts ?? [],
    slices: sliceTable(view).rows.filter((row) => row.tenantId === id),
  };
}
