// Issues tenant notices for a window that has just been cleared: one per affected tenant, queued for sending
// when within the tenant's lead time, else left `blocked` for an admin to override. With none blocked, the
// window moves on to `notified`. Runs inside the caller's transaction (the one that reached the quorum).
import type { Queryable } from '../../../db/client';
import { lockWindowNotices, type NoticeRow } from '../../queries/notices/notice-rows';
import { setWindowStatus } from '../windows/set-window-status';
import { composeNotice } from './compose-notice';
import { NoticeStateError } from './errors';
import { auditNotice, stateOf } from './notice-audit';
import { loadWindowNoticeInputs, type NoticeTenant, type WindowNoticeInputs } from './notice-inputs';
import { parseMailbox } from './notice-ics';
import { newNoticeId, noticeUid, queueNoticeMail, storeNoticeVersion, type NoticeDeps } from './notice-version';
import { cancelNotice } from './withdraw-notices';

export type { NoticeDeps } from './notice-version';

const DAY_MS = 86_400_000;

/** Later than `leadDays` before the start: the tenant was owed notice sooner. */
export function isLate(startsAt: Date, now: Date, leadDays: number): boolean {
  return startsAt.getTime() - now.getTime() < leadDays * DAY_MS;
}

type Tally = { queued: number; blocked: number; failed: number };

async function issueOne(tx: Queryable, deps: NoticeDeps, inputs: WindowNoticeInputs, tenant: NoticeTenant, prev: NoticeRow | undefined, actorId: string, tally: Tally) {
  const w = inputs.window;
  const content = composeNotice({
    window: w, tenant, slices: inputs.slicesByTenant.get(tenant.id) ?? [], lookups: inputs.lookups,
    outageAccepted: inputs.outageAccepted, afterWindow: inputs.afterWindow, timeZone: tenant.timeZone,
    leadDays: tenant.leadDays, contact: { ...parseMailbox(deps.config.mailFrom), name: 'Network operations centre' },
  });
  const version = {
    id: prev?.id ?? newNoticeId(), uid: noticeUid(w.id, tenant.id), sequence: prev ? prev.sequence + 1 : 0,
    method: 'REQUEST' as const, content, recipients: tenant.recipients,
  };
  const late = isLate(w.startsAt, deps.now, tenant.leadDays);
  const rendered = await storeNoticeVersion(tx, deps, version, late ? 'blocked' : 'queued', !prev);
  const status = late ? 'blocked' : await queueNoticeMail(tx, deps, version, rendered);
  tally[status] += 1;
  await auditNotice(tx, {
    actorId, action: 'notice.issue', noticeId: version.id, at: deps.now, before: prev ? stateOf(prev) : null,
    after: { status, method: 'REQUEST', sequence: version.sequence, leadDays: tenant.leadDays, recipients: tenant.recipients.length },
  });
}

/**
 * Composes one notice per affected tenant of a `cleared` window, queues the mails of those within lead time,
 * leaves late ones `blocked`, and moves the window to `notified` when none is blocked.
 * A tenant told earlier (before the window went back for changes) that is no longer affected gets a cancellation.
 */
export async function issueNotices(
  tx: Queryable, deps: NoticeDeps, windowId: string, actorId: string,
): Promise<{ queued: number; blocked: number }> {
  const inputs = await loadWindowNoticeInputs(tx, windowId);
  if (inputs.window.status !== 'cleared') throw new NoticeStateError(`Notices go out for cleared windows; this one is ${inputs.window.status}.`);
  const existing = await lockWindowNotices(tx, windowId);
  const prevByTenant = new Map(existing.map((n) => [n.tenantId, n]));
  const tally: Tally = { queued: 0, blocked: 0, failed: 0 };
  for (const tenant of [...inputs.tenants.values()].sort((a, b) => a.id.localeCompare(b.id))) {
    await issueOne(tx, deps, inputs, tenant, prevByTenant.get(tenant.id), actorId, tally);
  }
  for (const prev of existing) {
    if (!inputs.tenants.has(prev.tenantId) && prev.method === 'REQUEST') await cancelNotice(tx, deps, prev, actorId);
  }
  if (tally.blocked === 0) await markNotified(tx, deps, windowId, actorId, tally);
  return { queued: tally.queued, blocked: tally.blocked };
}

export async function markNotified(tx: Queryable, deps: NoticeDeps, windowId: string, actorId: string, details: Record<string, unknown>) {
  await setWindowStatus(tx, { windowId, from: ['cleared'], to: 'notified', actorId, action: 'notices.issue', now: deps.now, details });
}
