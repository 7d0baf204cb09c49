// The one way a window changes state (assessed, edited back to draft, plan accepted, sent for sign-off, cleared,
// returned, notified, started, finished, withdrawn …): checks the state or version the caller relies on, moves the
// status, bumps the version and writes the audit row, all in the caller's transaction.
import type { WindowStatus } from '../../../shared/windows';
import { insertAuditEntry } from '../../queries/audit/audit-log';
import { selectWindowState, updateWindowStatus, type WindowColumns } from '../../queries/windows/window-status';
import type { Queryable } from '../../../db/client';
import { IllegalTransitionError, StaleVersionError } from './errors';

type Facts = Record<string, unknown>;

export interface StatusChange {
  windowId: string;
  /** the states the window may be in for this change; anything else is refused (409) */
  from?: readonly WindowStatus[];
  /** optimistic locking: the version the caller read; another version is refused as stale (409) */
  version?: number;
  to: WindowStatus;
  actorId: string | null;
  /** audit action, e.g. `plan.accept`, `signoff.submit` */
  action: string;
  now: Date;
  /** extra columns to set in the same update */
  set?: WindowColumns;
  /** extra facts for the audit row's `after` */
  details?: Facts;
  /** work that belongs to the change, run after the update and before the audit row; its facts join `after` */
  alongside?: (version: number) => Promise<Facts | void>;
  /** the audit row's before and after when they record the whole window (an edit), not only status and version */
  snapshot?: { before: Facts; after: (version: number) => Facts };
}

async function lockedState(tx: Queryable, c: StatusChange) {
  const before = await selectWindowState(tx, c.windowId, { forUpdate: true });
  if (c.version !== undefined && before?.version !== c.version) throw new StaleVersionError();
  if (!before) throw new IllegalTransitionError('(missing)', c.to, `window ${c.windowId} does not exist.`);
  if (c.from && !c.from.includes(before.status)) {
    throw new IllegalTransitionError(before.status, c.to, `This needs the window in: ${c.from.join(', ')}.`);
  }
  return before;
}

/** Run inside the caller's transaction; returns the new version. */
export async function setWindowStatus(tx: Queryable, c: StatusChange): Promise<number> {
  const before = await lockedState(tx, c);
  const version = await updateWindowStatus(tx, c.windowId, { to: c.to, now: c.now, set: c.set }, { statuses: c.from, version: c.version });
  if (version === null) throw new StaleVersionError();
  const facts = (await c.alongside?.(version)) ?? {};
  const base = c.snapshot
    ? { before: c.snapshot.before, after: c.snapshot.after(version) }
    : { before: { status: before.status, version: before.version }, after: { status: c.to, version, ...c.set } };
  await insertAuditEntry(tx, {
    actorId: c.actorId, action: c.action, entity: 'window', entityId: c.windowId, at: c.now,
    before: base.before, after: { ...base.after, ...c.details, ...facts },
  });
  return version;
}
