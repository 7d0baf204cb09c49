// Audit rows for notices: who changed which notice, from what to what.
import { insertAuditEntry } from '../../queries/audit/audit-log';
import type { Queryable } from '../../../db/client';

type NoticeState = { status: string; method: string; sequence: number; [key: string]: unknown };

export async function auditNotice(tx: Queryable, e: {
  actorId: string | null; action: string; noticeId: string; at: Date; before: NoticeState | null; after: NoticeState | Record<string, unknown>;
}): Promise<void> {
  await insertAuditEntry(tx, { actorId: e.actorId, action: e.action, entity: 'notice', entityId: e.noticeId, at: e.at, before: e.before, after: e.after });
}

export function stateOf(row: { status: string; method: string; sequence: number }): NoticeState {
  return { status: row.status, method: row.method, sequence: row.sequence };
}
