// Changes to one notice after it was issued: an admin's lead-time override, a resend after a failure, and the
// tenant's acknowledgement. Each writes an audit row in the same transaction.
import type { Db, Queryable } from '../../../db/client';
import { noticeContentSchema } from '../../../shared/notices';
import { lockNoticeRow, selectBlockedInvitationIds, updateNoticeRow, type NoticeRow } from '../../queries/notices/notice-rows';
import { selectWindowState } from '../../queries/windows/window-status';
import { NoticeStateError } from './errors';
import { markNotified } from './issue-notices';
import { auditNotice, stateOf } from './notice-audit';
import { loadTenants } from './notice-inputs';
import { queueNoticeMail, storeNoticeVersion, type NoticeDeps } from './notice-version';
import { findVisibleNotice } from './notice-views';

async function lockNotice(tx: Queryable, id: string): Promise<NoticeRow> {
  await lockNoticeRow(tx, id);
  return findVisibleNotice(tx, id, null);
}

/** Re-renders the current version for today's recipients and queues it. */
async function requeue(tx: Queryable, deps: NoticeDeps, row: NoticeRow, leadOverrideReason: string | null) {
  const tenant = (await loadTenants(tx, [row.tenantId])).get(row.tenantId);
  const content = { ...noticeContentSchema.parse(row.content), leadOverrideReason };
  const version = { id: row.id, uid: row.uid, sequence: row.sequence, method: row.method, content, recipients: tenant?.recipients ?? [] };
  const rendered = await storeNoticeVersion(tx, deps, version, 'queued', false);
  return queueNoticeMail(tx, deps, version, rendered);
}

/** When the last blocked notice of a cleared window goes out, the window is notified. */
async function notifyWhenNoneBlocked(tx: Queryable, deps: NoticeDeps, windowId: string, actorId: string) {
  const w = await selectWindowState(tx, windowId);
  const blocked = await selectBlockedInvitationIds(tx, windowId);
  if (w?.status === 'cleared' && blocked.length === 0) await markNotified(tx, deps, windowId, actorId, { after: 'lead-time override' });
}

export async function overrideNotice(db: Db, deps: NoticeDeps, id: string, reason: string, actorId: string): Promise<void> {
  await db.transaction(async (tx) => {
    const row = await lockNotice(tx, id);
    if (row.status !== 'blocked' || row.method !== 'REQUEST') {
      throw new NoticeStateError('Only a notice held back for lead time can be sent with an override.');
    }
    const status = await requeue(tx, deps, row, reason);
    await auditNotice(tx, { actorId, action: 'notice.override', noticeId: id, at: deps.now, before: stateOf(row), after: { ...stateOf(row), status, reason } });
    await notifyWhenNoneBlocked(tx, deps, row.windowId, actorId);
  });
}

export async function resendNotice(db: Db, deps: NoticeDeps, id: string, actorId: string): Promise<void> {
  await db.transaction(async (tx) => {
    const row = await lockNotice(tx, id);
    if (row.status !== 'failed') throw new NoticeStateError('Only a notice whose sending failed can be sent again.');
    const status = await requeue(tx, deps, row, row.leadOverrideReason);
    await auditNotice(tx, { actorId, action: 'notice.resend', noticeId: id, at: deps.now, before: { ...stateOf(row), lastError: row.lastError }, after: { ...stateOf(row), status } });
  });
}

/** Records the first acknowledgement (time and user); acknowledging again changes nothing. */
export async function acknowledgeNotice(db: Db, id: string, user: { id: string; tenantId: string }, now: Date): Promise<void> {
  await db.transaction(async (tx) => {
    await lockNoticeRow(tx, id);
    const row = await findVisibleNotice(tx, id, user.tenantId);
    if (row.acknowledgedAt) return;
    await updateNoticeRow(tx, id, { acknowledgedAt: now, acknowledgedBy: user.id, updatedAt: now });
    await auditNotice(tx, {
      actorId: user.id, action: 'notice.acknowledge', noticeId: id, at: now,
      before: { ...stateOf(row), acknowledgedAt: null }, after: { ...stateOf(row), acknowledgedAt: now.toISOString() },
    });
  });
}
