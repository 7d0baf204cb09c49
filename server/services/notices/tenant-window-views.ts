// What a tenant user reads about maintenance: the windows it was notified of, each in the words of its notice
// (summary, times in its zone, its own slices by name and what happens to them). Work it was not yet told about
// (no notice, or one still held back for lead time) does not exist for it; nothing internal (title, owner,
// elements, notes, MOP, freeze-override reason) is read at all.
import { noticeContentSchema } from '../../../shared/notices';
import type { TenantOverview, TenantWindowView, TenantWorkStage } from '../../../shared/tenant-windows';
import { durationHours } from '../../../shared/window-checks';
import type { Db, Queryable } from '../../../db/client';
import { selectTenantNotices, type TenantNoticeRow } from '../../queries/notices/tenant-notices';
import { getTenantFigures, HORIZON_DAYS } from '../../queries/overview/overview-figures';
import { domainError } from '../../errors';
import { InventoryNotFoundError } from '../inventory/errors';
import { WindowNotFoundError } from '../windows/errors';

/** A tenant user filtering by a site or span: elements are internal, so the filter does not exist for it. */
export class ElementFilterNotFoundError extends domainError('ELEMENT_NOT_FOUND', 404,
  (id: string) => `No site or span "${id}" for the element filter.`) {}

const NEXT_WORK = 5;
const DAY_MS = 86_400_000;

function stageOf(windowStatus: string, cancelled: boolean): TenantWorkStage {
  if (cancelled || windowStatus === 'withdrawn') return 'cancelled';
  if (windowStatus === 'underway') return 'underway';
  if (windowStatus === 'done' || windowStatus === 'rolled-back') return 'finished';
  return 'planned';
}

export function toTenantWindowView({ notice, windowStatus }: TenantNoticeRow): TenantWindowView {
  const c = noticeContentSchema.parse(notice.content);
  return {
    windowId: notice.windowId, noticeId: notice.id, summary: c.summary,
    startsAt: new Date(c.startsAt).toISOString(), endsAt: new Date(c.endsAt).toISOString(),
    durationHours: durationHours(c.startsAt, c.endsAt),
    timeZone: c.timeZone, whenLocal: c.whenLocal, whenUtc: c.whenUtc,
    stage: stageOf(windowStatus, c.cancelled || notice.method === 'CANCEL'),
    critical: c.slices.some((s) => s.critical),
    effect: c.effect, effectText: c.effectText, afterWork: c.afterWork,
    slices: c.slices.map((s) => ({
      name: s.name, critical: s.critical, outcome: s.outcome, changes: s.changes, effect: s.effect, effectText: s.effectText,
    })),
    leadOverrideReason: c.leadOverrideReason,
    acknowledgedAt: notice.acknowledgedAt?.toISOString() ?? null,
  };
}

export type TenantListQuery = { from: Date; to: Date; mine?: boolean; element?: string; tenant?: string };

/**
 * The calendar's list for a tenant: notified work overlapping [from, to) that still goes ahead. A filter naming
 * another tenant, or an element, answers 404 like a missing one; "mine" is empty (a tenant books nothing).
 * A status filter is ignored: the operator's states are internal, and the view's `stage` stands in for them.
 */
export async function tenantWindowViews(db: Queryable, tenantId: string, q: TenantListQuery): Promise<TenantWindowView[]> {
  if (q.tenant && q.tenant !== tenantId) throw new InventoryNotFoundError('tenant', q.tenant);
  if (q.element) throw new ElementFilterNotFoundError(q.element);
  if (q.mine) return [];
  const rows = await selectTenantNotices(db, { tenantId, from: q.from, to: q.to, activeOnly: true });
  return rows.map(toTenantWindowView);
}

/** One window as its tenant reads it (a cancellation included); 404 when the tenant was never told of it. */
export async function tenantWindowView(db: Queryable, tenantId: string, windowId: string): Promise<TenantWindowView> {
  const [row] = await selectTenantNotices(db, { tenantId, windowId });
  if (!row) throw new WindowNotFoundError(windowId);
  return toTenantWindowView(row);
}

/** The tenant's overview: its footprint's figures, and the notified work not yet over. */
export async function tenantOverview(db: Db, tenantId: string, now: Date): Promise<TenantOverview> {
  const figures = await getTenantFigures(db, { tenantId });
  const open = (await selectTenantNotices(db, { tenantId, from: now, activeOnly: true })).map(toTenantWindowView);
  const horizonMs = now.getTime() + HORIZON_DAYS * DAY_MS;
  const soon = open.filter((w) => Date.parse(w.startsAt) >= now.getTime() && Date.parse(w.startsAt) < horizonMs);
  return { scope: 'tenant', ...figures, windowsNext30Days: soon.length, nextWork: open.slice(0, NEXT_WORK) };
}
