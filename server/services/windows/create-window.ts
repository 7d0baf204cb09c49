// Books a new window (draft): checks the rules, writes window + elements + audit row in one transaction.
import { randomUUID } from 'node:crypto';
import type { Db, Tx } from '../../../db/client';
import type { Me } from '../../../shared/api';
import type { WindowCreate } from '../../../shared/windows';
import { insertAuditEntry } from '../../queries/audit/audit-log';
import { insertWindowRow, replaceElements } from '../../queries/windows/window-rows';
import { checkBooking, toElementRows } from './booking-checks';
import { windowSnapshot } from './snapshot';

export async function createWindow(db: Db, input: WindowCreate, user: Me, now: Date): Promise<string> {
  return db.transaction((tx) => bookWindowIn(tx, input, user, now));
}

/** The checks and writes of a booking inside the caller's transaction (which may claim an idempotency key too). */
export async function bookWindowIn(tx: Tx, input: WindowCreate, user: Me, now: Date): Promise<string> {
  const freezeOverrideReason = await checkBooking(tx, {
    times: { startsAt: input.startsAt, endsAt: input.endsAt },
    elements: input.elements,
    freezeOverrideReason: input.freezeOverrideReason,
  }, user, now);
  const id = `w-${randomUUID()}`;
  const row = {
    title: input.title, startsAt: new Date(input.startsAt), endsAt: new Date(input.endsAt),
    workType: input.workType ?? null, notes: input.notes ?? null, status: 'draft' as const, freezeOverrideReason,
  };
  const elements = toElementRows(input.elements);
  await insertWindowRow(tx, { ...row, id, ownerId: user.id, now });
  await replaceElements(tx, id, elements);
  await insertAuditEntry(tx, {
    actorId: user.id, action: 'window.create', entity: 'window', entityId: id, at: now,
    before: null, after: windowSnapshot({ ...row, version: 1, elements }),
  });
  return id;
}
