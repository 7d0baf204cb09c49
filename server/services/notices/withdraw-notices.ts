// Withdrawal: every tenant that was sent an invitation for the window gets a cancellation with the same UID,
// SEQUENCE + 1 and STATUS:CANCELLED (RFC 5546 §3.2.5). Runs in the transaction that withdraws the window.
import { noticeContentSchema } from '../../../shared/notices';
import type { Queryable } from '../../../db/client';
import { lockWindowNotices, type NoticeRow } from '../../queries/notices/notice-rows';
import { auditNotice, stateOf } from './notice-audit';
import { loadTenants } from './notice-inputs';
import { queueNoticeMail, storeNoticeVersion, type NoticeDeps } from './notice-version';

/** What a caller outside the notices service passes for sending (the time comes with the change). */
export type NoticeMailDeps = Omit<NoticeDeps, 'now'>;

/** Sends (or, for a notice that never went out, only records) the cancellation of one notice. */
export async function cancelNotice(tx: Queryable, deps: NoticeDeps, row: NoticeRow, actorId: string | null): Promise<'queued' | 'recorded' | 'failed'> {
  const tenant = (await loadTenants(tx, [row.tenantId])).get(row.tenantId);
  const content = { ...noticeContentSchema.parse(row.content), cancelled: true };
  const version = { id: row.id, uid: row.uid, sequence: row.sequence + 1, method: 'CANCEL' as const, content, recipients: tenant?.recipients ?? [] };
  // A notice still blocked never reached the tenant: there is no invitation to cancel, so nothing is sent.
  const neverSent = row.status === 'blocked';
  const rendered = await storeNoticeVersion(tx, deps, version, neverSent ? 'blocked' : 'queued', false);
  const outcome = neverSent ? 'recorded' : await queueNoticeMail(tx, deps, version, rendered);
  await auditNotice(tx, {
    actorId, action: 'notice.cancel', noticeId: row.id, at: deps.now, before: stateOf(row),
    after: { status: neverSent ? 'blocked' : outcome, method: 'CANCEL', sequence: version.sequence },
  });
  return outcome;
}

export async function withdrawNotices(tx: Queryable, deps: NoticeDeps, windowId: string, actorId: string): Promise<{ cancelled: number }> {
  const rows = await lockWindowNotices(tx, windowId, { method: 'REQUEST' });
  let cancelled = 0;
  for (const row of rows) {
    if ((await cancelNotice(tx, deps, row, actorId)) === 'queued') cancelled += 1;
  }
  return { cancelled };
}
