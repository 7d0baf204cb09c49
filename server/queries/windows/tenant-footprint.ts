// SQL conditions: does a window (the outer "windows" row) touch a tenant's slices' CURRENT placements?
import { sql, type SQL } from 'drizzle-orm';

/** Spans on the tenant's current tie paths. */
function footprintSpans(tenantId: string): SQL {
  return sql`select sp.id from placements p join slices s on s.id = p.slice_id
    cross join lateral jsonb_each(p.paths) tie cross join lateral jsonb_array_elements_text(tie.value) as sp(id)
    where p.current and s.tenant_id = ${tenantId}`;
}

/** Sites hosting the tenant's functions, plus both ends of every span its ties cross (transit sites). */
function footprintSites(tenantId: string): SQL {
  return sql`select fn.value from placements p join slices s on s.id = p.slice_id
      cross join lateral jsonb_each_text(p.sites) fn where p.current and s.tenant_id = ${tenantId}
    union select x.site_a from spans x where x.id in (${footprintSpans(tenantId)})
    union select x.site_b from spans x where x.id in (${footprintSpans(tenantId)})`;
}

/** True for a window with at least one element in the tenant's footprint. */
export function windowTouchesTenant(tenantId: string): SQL {
  return sql`exists (select 1 from window_elements we where we.window_id = "windows"."id" and (
    (we.element_kind = 'span' and we.element_id in (${footprintSpans(tenantId)})) or
    (we.element_kind = 'site' and we.element_id in (${footprintSites(tenantId)}))))`;
}
