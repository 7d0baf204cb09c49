// Read side of notices: one notice for its tenant (or staff), a window's notices for staff, the tenant portal.
import { noticeContentSchema, type Notice, type NoticeStatusRow, type PortalWork } from '../../../shared/notices';
import { getUsersByIds } from '../../queries/auth/users';
import {
  selectNotice, selectSentNoticesOfOpenWindows, selectWindowNoticesWithTenant, type NoticeRow,
} from '../../queries/notices/notice-rows';
import type { Queryable } from '../../../db/client';
import { NoticeNotFoundError } from './errors';
import { loadTenants } from './notice-inputs';

function toNotice(row: NoticeRow, acknowledgedByName: string | null): Notice {
  return {
    id: row.id, windowId: row.windowId, tenantId: row.tenantId, status: row.status, method: row.method,
    sequence: row.sequence, subject: row.subject, content: noticeContentSchema.parse(row.content),
    sentAt: row.sentAt?.toISOString() ?? null, acknowledgedAt: row.acknowledgedAt?.toISOString() ?? null,
    acknowledgedByName, updatedAt: row.updatedAt.toISOString(),
  };
}

async function noticesWithAckNames(db: Queryable, rows: NoticeRow[]): Promise<Notice[]> {
  const byId = await getUsersByIds(db, rows.map((r) => r.acknowledgedBy));
  return rows.map((r) => toNotice(r, r.acknowledgedBy ? byId.get(r.acknowledgedBy)?.name ?? null : null));
}

/**
 * The notice row as `scopeTenant` may see it: another tenant's notice, or one still blocked (never sent to the
 * tenant), is "not found" for a tenant user — the same answer as an id that does not exist.
 */
export async function findVisibleNotice(db: Queryable, id: string, scopeTenant: string | null): Promise<NoticeRow> {
  const row = await selectNotice(db, id);
  if (!row) throw new NoticeNotFoundError(id);
  if (scopeTenant !== null && (row.tenantId !== scopeTenant || row.status === 'blocked')) throw new NoticeNotFoundError(id);
  return row;
}

export async function noticeView(db: Queryable, id: string, scopeTenant: string | null): Promise<Notice> {
  const [notice] = await noticesWithAckNames(db, [await findVisibleNotice(db, id, scopeTenant)]);
  return notice;
}

export async function windowNoticeRows(db: Queryable, windowId: string): Promise<NoticeStatusRow[]> {
  const rows = await selectWindowNoticesWithTenant(db, windowId);
  const recipients = await loadTenants(db, rows.map((r) => r.n.tenantId));
  return rows.map(({ n, tenantName }) => ({
    id: n.id, tenantId: n.tenantId, tenantName, status: n.status, method: n.method, sequence: n.sequence,
    recipients: recipients.get(n.tenantId)?.recipients ?? [], attempts: n.attempts, lastError: n.lastError,
    sentAt: n.sentAt?.toISOString() ?? null, acknowledgedAt: n.acknowledgedAt?.toISOString() ?? null,
    leadDays: noticeContentSchema.parse(n.content).leadDays, leadOverrideReason: n.leadOverrideReason,
    updatedAt: n.updatedAt.toISOString(),
  }));
}

/**
 * Upcoming work on the tenant's slices that it was notified of (not yet over), each with its notice. Work without a
 * notice that went out to the tenant (none issued yet, or held back for lead time) is not listed: tenants learn of
 * work from its notice. A withdrawn window stays (its cancellation is news), and so does one that moves a slice of
 * the tenant's only to make room (a knock-on move). The list's zone is the viewer's own (their choice, else the
 * network's), the zone the portal shows its times in; each notice keeps the zone it was written in for the tenant.
 */
export async function portalWork(db: Queryable, viewer: { tenantId: string; timeZone: string }, now: Date): Promise<PortalWork> {
  const { tenantId, timeZone } = viewer;
  const sent = await selectSentNoticesOfOpenWindows(db, tenantId, now);
  const byWindow = new Map((await noticesWithAckNames(db, sent.map((r) => r.notices))).map((n) => [n.windowId, n]));
  const items = sent.map(({ windows: w }) => {
    const notice = byWindow.get(w.id)!;
    return {
      windowId: w.id, summary: notice.content.summary, startsAt: notice.content.startsAt, endsAt: notice.content.endsAt,
      critical: notice.content.slices.some((s) => s.critical), notice,
    };
  });
  const list = items.sort((a, b) => a.startsAt.localeCompare(b.startsAt) || a.windowId.localeCompare(b.windowId));
  return { timeZone, items: list };
}
