// A window's history for staff: its audit rows turned into dated events with a person's name and any comment.
import type { Queryable } from '../../../db/client';
import { windowStatusSchema, type WindowStatus } from '../../../shared/windows';
import type { WindowEvent, WindowEventKind, WindowHistory } from '../../../shared/window-history';
import { selectWindowAuditRows, type WindowAuditRow } from '../../queries/audit/window-history';
import { loadWindow } from './window-view';

const KIND_BY_ACTION: Record<string, WindowEventKind> = {
  'window.create': 'booked',
  'window.update': 'edited',
  'window.assess': 'assessed',
  'window.mop.upload': 'mop-attached',
  'window.transition': 'moved',
  'plan.enqueue': 'run-started',
  'plan.cancel': 'run-cancelled',
  'plan.fail': 'run-failed',
  'plan.accept': 'plan-accepted',
  'signoff.submit': 'submitted',
  'signoff.cleared': 'cleared',
  'notices.issue': 'notified',
};

/**
 * `signoff.send-back` is left out: the approver's decision row just before it says the same, with the comment.
 * Decisions are told apart by what was decided.
 */
function kindOf(row: WindowAuditRow, after: Record<string, unknown>): WindowEventKind | null {
  if (row.action === 'signoff.decision') return after.decision === 'send-back' ? 'sent-back' : 'approved';
  return KIND_BY_ACTION[row.action] ?? null;
}

const text = (v: unknown) => (typeof v === 'string' && v.trim() !== '' ? v : null);

function toEvent(row: WindowAuditRow): WindowEvent | null {
  const after = (row.after && typeof row.after === 'object' ? row.after : {}) as Record<string, unknown>;
  const kind = kindOf(row, after);
  if (!kind) return null;
  const status = row.entity === 'window' ? windowStatusSchema.safeParse(after.status) : null;
  return {
    id: String(row.id),
    kind,
    at: row.at.toISOString(),
    by: row.actorName,
    status: status?.success ? (status.data as WindowStatus) : null,
    comment: text(after.comment) ?? text(after.reason),
    reverted: after.reverted === true,
    round: typeof after.round === 'number' ? after.round : null,
  };
}

export async function windowHistory(db: Queryable, windowId: string): Promise<WindowHistory> {
  await loadWindow(db, windowId, null);
  const rows = await selectWindowAuditRows(db, windowId);
  return { windowId, events: rows.map(toEvent).filter((e): e is WindowEvent => e !== null) };
}
