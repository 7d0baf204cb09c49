// The audit trail for admins and approvers: a page of entries in words, what the filters offer, and every
// filtered entry as CSV. Read only: nothing here changes an audit row.
import type { Queryable } from '../../../db/client';
import { actionWords } from '../../../shared/audit-actions';
import type { AuditChoices, AuditEntry, AuditPage, AuditQuery } from '../../../shared/audit';
import { csvText } from '../csv-text';
import { selectSubjectNames } from '../../queries/audit/audit-subjects';
import { listAuditRows, selectAuditChoices, type AuditFilter } from '../../queries/audit/audit-trail';
import { formatAtIn } from '../pack/moves-csv';
import { subjectIdsOf, toAuditEntry } from './audit-entry';
import { TooManyAuditRowsError } from './errors';

const BARE_DAY = /^\d{4}-\d{2}-\d{2}$/;
const DAY_MS = 86_400_000;

/** A bare day as `to` means up to the end of that day (UTC); instants are taken as given. */
export function filterOf(q: AuditQuery): AuditFilter {
  const to = q.to ? new Date(Date.parse(q.to) + (BARE_DAY.test(q.to) ? DAY_MS : 0)) : undefined;
  return { windowId: q.window, actorId: q.person, action: q.action, from: q.from ? new Date(q.from) : undefined, to };
}

async function entries(db: Queryable, f: AuditFilter, page: { limit: number; offset: number }, timeZone: string) {
  const { rows, total } = await listAuditRows(db, f, page);
  const names = await selectSubjectNames(db, subjectIdsOf(rows));
  return { items: rows.map((r) => toAuditEntry(r, names, timeZone)), total };
}

export async function auditPage(db: Queryable, q: AuditQuery, timeZone: string): Promise<AuditPage> {
  const { items, total } = await entries(db, filterOf(q), { limit: q.pageSize, offset: (q.page - 1) * q.pageSize }, timeZone);
  return { items, total, page: q.page, pageSize: q.pageSize };
}

export async function auditChoices(db: Queryable): Promise<AuditChoices> {
  const c = await selectAuditChoices(db);
  const actions = c.actions.map((code) => ({ code, words: actionWords(code) })).sort((a, b) => a.words.localeCompare(b.words));
  return { people: c.people, windows: c.windows, actions };
}

/** The most rows one CSV holds; past it the person narrows the filters (a date range) rather than wait. */
export const AUDIT_CSV_MAX_ROWS = 20_000;

export const AUDIT_CSV_COLUMNS = [
  'When (your time zone)', 'When (UTC)', 'Who', 'What', 'Window or object', 'Changes', 'Comment',
] as const;

function csvRow(e: AuditEntry, timeZone: string): string[] {
  const at = new Date(e.at);
  return [
    formatAtIn(at, timeZone), formatAtIn(at, 'UTC'), e.who ?? 'The system or someone no longer listed', e.what,
    e.subject ? `${e.subject.kind} “${e.subject.name}”` : '', e.changes.join('; '), e.comment ?? '',
  ];
}

/** Every entry the filters match (paging ignored), newest first, as CSV text with a header row. */
export async function auditCsv(db: Queryable, q: AuditQuery, timeZone: string): Promise<string> {
  const { items, total } = await entries(db, filterOf(q), { limit: AUDIT_CSV_MAX_ROWS + 1, offset: 0 }, timeZone);
  if (total > AUDIT_CSV_MAX_ROWS) throw new TooManyAuditRowsError(total, AUDIT_CSV_MAX_ROWS);
  return csvText(AUDIT_CSV_COLUMNS, items.map((e) => csvRow(e, timeZone)));
}
