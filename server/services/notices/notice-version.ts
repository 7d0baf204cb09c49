// One version of a notice: renders subject, text and invitation from its content, stores them on the row,
// and queues the e-mail. Every send of a changed notice is a new version (SEQUENCE + 1, RFC 5545 §3.8.7.4).
import { randomUUID } from 'node:crypto';
import type { NoticeContent, NoticeMethod } from '../../../shared/notices';
import type { ServerConfig } from '../../env';
import type { Queryable } from '../../../db/client';
import { insertNoticeRow, updateNoticeRow } from '../../queries/notices/notice-rows';
import type { MailQueue } from '../ports';
import { buildNoticeIcs } from './notice-ics';
import { noticeBody, noticeSubject } from './render-notice';

export type NoticeDeps = { jobs: MailQueue; config: ServerConfig; now: Date };

export type NoticeVersion = {
  id: string; uid: string; sequence: number; method: NoticeMethod; content: NoticeContent; recipients: string[];
};

export function noticeUid(windowId: string, tenantId: string): string {
  return `${windowId}.${tenantId}@slackwater.invalid`;
}

export function newNoticeId(): string {
  return `ntc-${randomUUID()}`;
}

export function noticePortalUrl(config: ServerConfig, id: string): string {
  return `${config.publicUrl}/notices/${id}`;
}

export function renderNotice(v: NoticeVersion, deps: Pick<NoticeDeps, 'config' | 'now'>) {
  const subject = noticeSubject(v.content, v.sequence);
  const url = noticePortalUrl(deps.config, v.id);
  const body = noticeBody(v.content, { sequence: v.sequence, portalUrl: url });
  const ics = buildNoticeIcs({
    uid: v.uid, sequence: v.sequence, method: v.method, stamp: deps.now,
    startsAt: new Date(v.content.startsAt), endsAt: new Date(v.content.endsAt),
    summary: v.content.summary, description: body, organizer: v.content.contact, attendees: v.recipients, url,
  });
  return { subject, body, ics };
}

/** Queues the stored version's e-mail; a tenant without any address cannot be told, which is a failure to fix. */
export async function queueNoticeMail(tx: Queryable, deps: NoticeDeps, v: NoticeVersion, r: { subject: string; body: string; ics: string }): Promise<'queued' | 'failed'> {
  if (v.recipients.length === 0) {
    await updateNoticeRow(tx, v.id, { status: 'failed', lastError: 'The tenant has no notice contacts or users to send to.', updatedAt: deps.now });
    return 'failed';
  }
  await deps.jobs.sendMail({
    to: v.recipients, subject: r.subject, text: r.body, noticeId: v.id, noticeSequence: v.sequence,
    calendar: { method: v.method, content: r.ics, filename: v.method === 'CANCEL' ? 'cancellation.ics' : 'invitation.ics' },
  });
  return 'queued';
}

/**
 * Writes a version (insert or replace) with a fresh sending state; `status` is `blocked` or `queued`.
 * A new version needs a new acknowledgement, so the old one is cleared.
 */
export async function storeNoticeVersion(tx: Queryable, deps: Pick<NoticeDeps, 'config' | 'now'>, v: NoticeVersion, status: 'blocked' | 'queued', isNew: boolean) {
  const rendered = renderNotice(v, deps);
  const values = {
    uid: v.uid, sequence: v.sequence, method: v.method, status, subject: rendered.subject, body: rendered.body,
    content: v.content, ics: rendered.ics, leadOverrideReason: v.content.leadOverrideReason,
    attempts: 0, lastError: null, sentAt: null, acknowledgedAt: null, acknowledgedBy: null, updatedAt: deps.now,
  };
  if (isNew) {
    await insertNoticeRow(tx, { id: v.id, windowId: v.content.windowId, tenantId: v.content.tenantId, createdAt: deps.now, ...values });
  } else {
    await updateNoticeRow(tx, v.id, values);
  }
  return rendered;
}
