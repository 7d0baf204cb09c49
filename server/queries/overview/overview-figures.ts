// Overview figures: network-wide for staff; for a tenant user, only its own slices and what they use.
import { sql, type SQL } from 'drizzle-orm';
import type { Db } from '../../../db/client';
import type { Overview } from '../../../shared/api';

const NEXT_WINDOWS = 5;
/** "Windows in the next 30 days": the same horizon for staff and tenant overviews. */
export const HORIZON_DAYS = 30;

type Figures = Omit<Overview, 'nextWindows'>;

/**
 * A tenant's footprint: sites hosting its functions or at either end of a span its ties cross
 * (a transit site going down breaks the path too), and the spans on its ties' paths; current placements only.
 * Its windows are not counted here: a tenant reads only the work it was notified of (services/notices/tenant-window-views.ts).
 */
function tenantFootprint(tenantId: string): SQL {
  return sql`
    tenant_placements as (
      select p.sites, p.paths from placements p join slices s on s.id = p.slice_id
      where p.current and s.tenant_id = ${tenantId}),
    footprint_spans as (
      select distinct sp.id from tenant_placements tp, jsonb_each(tp.paths) tie,
        jsonb_array_elements_text(tie.value) as sp(id)),
    footprint_sites as (
      select fn.value as id from tenant_placements tp, jsonb_each_text(tp.sites) fn
      union select s.site_a from spans s join footprint_spans f on f.id = s.id
      union select s.site_b from spans s join footprint_spans f on f.id = s.id)`;
}

const allWindows = sql`
  scoped_windows as (select w.id, w.title, w.starts_at, w.ends_at, w.status from windows w where w.status <> 'withdrawn')`;

async function getNextWindows(db: Db, ctes: SQL, now: Date): Promise<Overview['nextWindows']> {
  // Windows not yet over, so work that is under way stays on the list.
  const { rows } = await db.execute(sql`
    with ${ctes} select id, title, starts_at, ends_at, status from scoped_windows
    where ends_at > ${now.toISOString()}::timestamptz order by starts_at, id limit ${NEXT_WINDOWS}`);
  return rows.map((row) => ({
    id: String(row.id),
    title: String(row.title),
    startsAt: new Date(row.starts_at as string | Date).toISOString(),
    endsAt: new Date(row.ends_at as string | Date).toISOString(),
    status: String(row.status),
  }));
}

function windowsSoon(now: Date): SQL {
  return sql`(select count(*) from scoped_windows where starts_at >= ${now.toISOString()}::timestamptz
    and starts_at < ${now.toISOString()}::timestamptz + make_interval(days => ${HORIZON_DAYS}))::int`;
}

async function getFigures(db: Db, query: SQL): Promise<Figures> {
  const { rows } = await db.execute(query);
  const row = rows[0] as Record<string, number>;
  return {
    sites: row.sites, spans: row.spans, tenants: row.tenants, slices: row.slices,
    criticalSlices: row.critical_slices, windowsNext30Days: row.windows_next_30_days,
  };
}

export async function getNetworkOverview(db: Db, { now }: { now: Date }): Promise<Overview> {
  const figures = await getFigures(db, sql`with ${allWindows} select
    (select count(*) from sites)::int as sites, (select count(*) from spans)::int as spans,
    (select count(*) from tenants)::int as tenants, (select count(*) from slices)::int as slices,
    (select count(*) from slices where critical)::int as critical_slices,
    ${windowsSoon(now)} as windows_next_30_days`);
  return { ...figures, nextWindows: await getNextWindows(db, allWindows, now) };
}

export type TenantFigures = Omit<Figures, 'windowsNext30Days'>;

export async function getTenantFigures(db: Db, { tenantId }: { tenantId: string }): Promise<TenantFigures> {
  const { rows } = await db.execute(sql`with ${tenantFootprint(tenantId)} select
    (select count(distinct id) from footprint_sites)::int as sites, (select count(*) from footprint_spans)::int as spans,
    (select count(*) from tenants where id = ${tenantId})::int as tenants,
    (select count(*) from slices where tenant_id = ${tenantId})::int as slices,
    (select count(*) from slices where tenant_id = ${tenantId} and critical)::int as critical_slices`);
  const row = rows[0] as Record<string, number>;
  return { sites: row.sites, spans: row.spans, tenants: row.tenants, slices: row.slices, criticalSlices: row.critical_slices };
}
