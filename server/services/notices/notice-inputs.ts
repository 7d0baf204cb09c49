// Reads what composing a window's notices needs: the window, its accepted plan's review, the tenants with
// their recipients and lead time, and the look-ups that turn sites, spans and ties into tenant-facing words.
import { planReviewSchema, planSettingsSchema, type PlanSlice } from '../../../shared/plans';
import { spanLatencyMs } from '../../../shared/scenario';
import type { Queryable } from '../../../db/client';
import { selectActiveUsersOfTenants } from '../../queries/auth/tenant-users';
import { NETWORK_TIME_ZONE } from '../../../shared/time-zone';
import { selectNoticeWindow, selectSlicesByIds, selectTenantsByIds, selectWordingRows } from '../../queries/notices/notice-inputs';
import { selectPlanRow } from '../../queries/plans/plan-rows';
import { getPolicies } from '../../queries/windows/policies';
import { NoticeStateError } from './errors';
import type { NoticeLookups } from './slice-wording';

/** `timeZone`: the zone the tenant's people chose (the first account with a choice), else the network's zone. */
export type NoticeTenant = { id: string; name: string; leadDays: number; recipients: string[]; timeZone: string };

export type WindowNoticeInputs = {
  window: { id: string; startsAt: Date; endsAt: Date; workType: string | null; status: string };
  slicesByTenant: Map<string, PlanSlice[]>;
  tenants: Map<string, NoticeTenant>;
  lookups: NoticeLookups;
  outageAccepted: Set<string>;
  afterWindow: 'return' | 'keep';
};

export async function loadNoticeWindow(db: Queryable, windowId: string) {
  const w = await selectNoticeWindow(db, windowId);
  if (!w) throw new NoticeStateError(`No window ${windowId}.`);
  return w;
}

/** Affected slices of the accepted plan; slices listed as affected without an entry count as staying. */
async function acceptedPlanSlices(db: Queryable, planId: string | null) {
  if (!planId) throw new NoticeStateError('The window has no accepted plan.');
  const p = await selectPlanRow(db, planId);
  if (!p?.result) throw new NoticeStateError(`The accepted plan ${planId} has no result.`);
  const review = planReviewSchema.parse(p.result);
  const settings = planSettingsSchema.safeParse(p.settings ?? {});
  return {
    review,
    outageAccepted: new Set(p.outageAccepted ?? []),
    afterWindow: settings.success ? settings.data.afterWindow : 'return' as const,
  };
}

/** Affected slice ids the review names but has no row for (defensive: stays-put slices may be left out). */
async function missingSlices(db: Queryable, affected: string[], listed: Set<string>): Promise<PlanSlice[]> {
  const ids = affected.filter((id) => !listed.has(id));
  if (ids.length === 0) return [];
  const rows = await selectSlicesByIds(db, ids);
  return rows.map((r) => ({
    slice: r.id, name: r.name, tenantId: r.tenantId, critical: r.critical, priority: r.priority, sst: r.sst,
    reasons: [], outcome: 'stays', moves: [], reroutes: [], before: { sites: {}, paths: {} }, after: null, unresolvedReason: null,
    madeRoomFor: [],
  }));
}

export async function loadTenants(db: Queryable, ids: string[]): Promise<Map<string, NoticeTenant>> {
  // One after another: inside a transaction there is one connection (pg refuses overlapping queries on it).
  const rows = await selectTenantsByIds(db, ids);
  const tenantUsers = await selectActiveUsersOfTenants(db, ids.length > 0 ? ids : ['']);
  const policy = await getPolicies(db);
  const out = new Map<string, NoticeTenant>();
  for (const t of rows) {
    const accounts = tenantUsers.filter((u) => u.tenantId === t.id);
    const emails = [...t.contacts.map((c) => c.email), ...accounts.map((u) => u.email)];
    const recipients = [...new Set(emails.map((e) => e.trim().toLowerCase()).filter(Boolean))];
    const timeZone = accounts.find((u) => u.timeZone !== null)?.timeZone ?? NETWORK_TIME_ZONE;
    out.set(t.id, { id: t.id, name: t.name, leadDays: Math.max(t.noticeDays, policy.noticeLeadDays), recipients, timeZone });
  }
  return out;
}

async function loadLookups(db: Queryable, planSlices: PlanSlice[]): Promise<NoticeLookups> {
  const sliceIds = planSlices.map((s) => s.slice);
  const siteIds = planSlices.flatMap((s) => s.moves.flatMap((m) => [m.from, m.to]));
  const spanIds = planSlices.flatMap((s) => s.reroutes.flatMap((r) => [...r.from, ...r.to]));
  const { siteRows, spanRows, fnRows, tieRows } = await selectWordingRows(db, { siteIds, spanIds, sliceIds });
  return {
    sites: new Map(siteRows.map((s) => [s.id, { lat: s.lat, lon: s.lon }])),
    spanLatencyMs: new Map(spanRows.map((s) => [s.id, spanLatencyMs({ latencyMs: s.latencyMs ?? undefined, lengthKm: s.lengthKm })])),
    functionNames: new Map(fnRows.map((f) => [f.id, f.name ?? f.id])),
    ties: new Map(tieRows.map((t) => [t.id, { from: t.fromFunction, to: t.toFunction, maxLatencyMs: t.maxLatencyMs }])),
  };
}

export async function loadWindowNoticeInputs(db: Queryable, windowId: string): Promise<WindowNoticeInputs> {
  const w = await loadNoticeWindow(db, windowId);
  const { review, outageAccepted, afterWindow } = await acceptedPlanSlices(db, w.acceptedPlanId);
  const planSlices = [...review.slices, ...await missingSlices(db, review.affected, new Set(review.slices.map((s) => s.slice)))];
  const slicesByTenant = new Map<string, PlanSlice[]>();
  for (const s of planSlices) slicesByTenant.set(s.tenantId, [...(slicesByTenant.get(s.tenantId) ?? []), s]);
  const tenantMap = await loadTenants(db, [...slicesByTenant.keys()]);
  const lookups = await loadLookups(db, planSlices);
  return { window: w, slicesByTenant, tenants: tenantMap, lookups, outageAccepted, afterWindow };
}
