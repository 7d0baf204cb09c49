// Freeze writes (admin): each change in one transaction with its audit row.
import { randomUUID } from 'node:crypto';
import type { Db } from '../../../db/client';
import type { Me } from '../../../shared/api';
import type { Freeze, FreezeCreate, FreezePatch } from '../../../shared/freezes';
import { insertAuditEntry } from '../../queries/audit/audit-log';
import { deleteFreeze, getFreeze, insertFreeze, updateFreeze, type FreezeRow } from '../../queries/windows/freezes';
import { FreezeNotFoundError, FreezeOrderError } from './errors';

export function toFreeze(f: FreezeRow): Freeze {
  return {
    id: f.id, title: f.title, startsAt: f.startsAt.toISOString(), endsAt: f.endsAt.toISOString(),
    reason: f.reason, createdBy: f.createdBy, createdAt: f.createdAt.toISOString(),
  };
}

export async function createFreeze(db: Db, input: FreezeCreate, user: Me, now: Date): Promise<Freeze> {
  return db.transaction(async (tx) => {
    const row = await insertFreeze(tx, {
      id: `fz-${randomUUID()}`, title: input.title, startsAt: new Date(input.startsAt), endsAt: new Date(input.endsAt),
      reason: input.reason ?? null, createdBy: user.id, createdAt: now,
    });
    const after = toFreeze(row);
    await insertAuditEntry(tx, { actorId: user.id, action: 'freeze.create', entity: 'freeze', entityId: row.id, at: now, after });
    return after;
  });
}

export async function patchFreeze(db: Db, id: string, patch: FreezePatch, user: Me, now: Date): Promise<Freeze> {
  return db.transaction(async (tx) => {
    const before = await getFreeze(tx, id);
    if (!before) throw new FreezeNotFoundError(id);
    const startsAt = patch.startsAt ? new Date(patch.startsAt) : before.startsAt;
    const endsAt = patch.endsAt ? new Date(patch.endsAt) : before.endsAt;
    // The schema checks a pair sent together; a single new end must still follow the stored start.
    if (!(endsAt > startsAt)) throw new FreezeOrderError();
    const row = await updateFreeze(tx, id, {
      title: patch.title ?? before.title, startsAt, endsAt, reason: patch.reason === undefined ? before.reason : patch.reason,
    });
    const after = toFreeze(row!);
    await insertAuditEntry(tx, {
      actorId: user.id, action: 'freeze.update', entity: 'freeze', entityId: id, at: now, before: toFreeze(before), after,
    });
    return after;
  });
}

export async function removeFreeze(db: Db, id: string, user: Me, now: Date): Promise<void> {
  await db.transaction(async (tx) => {
    const row = await deleteFreeze(tx, id);
    if (!row) throw new FreezeNotFoundError(id);
    await insertAuditEntry(tx, {
      actorId: user.id, action: 'freeze.delete', entity: 'freeze', entityId: id, at: now, before: toFreeze(row), after: null,
    });
  });
}
