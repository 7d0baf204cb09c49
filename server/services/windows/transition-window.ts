// Moves a window along its lifecycle (withdraw, start, finish, roll back) under optimistic locking.
import type { Db } from '../../../db/client';
import type { Me } from '../../../shared/api';
import type { WindowTransition } from '../../../shared/windows';
import { insertAuditEntry } from '../../queries/audit';
import { updateWindowRow } from '../../queries/windows/window-rows';
import { applyPlanPlacements } from '../plans/apply-placements';
import { withdrawNotices, type NoticeMailDeps } from '../notices/withdraw-notices';
import { IllegalTransitionError, StaleVersionError, TransitionGuardedError } from './errors';
import { checkTransition } from './lifecycle';
import { loadWindow } from './window-view';

/** `notices`: the queue and config that withdrawal needs to send tenants their cancellations. */
export async function transitionWindow(
  db: Db, id: string, body: WindowTransition, user: Me, now: Date, notices: NoticeMailDeps,
): Promise<void> {
  const w = await loadWindow(db, id, null);
  if (body.version !== w.version) throw new StaleVersionError();
  const check = checkTransition(w.status, body.to);
  if (!check.ok && check.kind === 'illegal') throw new IllegalTransitionError(w.status, body.to, check.why);
  if (!check.ok) throw new TransitionGuardedError(body.to, check.why);
  await db.transaction(async (tx) => {
    const version = await updateWindowRow(tx, id, body.version, { status: body.to, now });
    if (version === null) throw new StaleVersionError();
    // Starting the work puts the accepted plan's placements in force; finishing or rolling back may restore them.
    await applyPlanPlacements(tx, { windowId: id, from: w.status, to: body.to, actorId: user.id, now });
    if (body.to === 'withdrawn') await withdrawNotices(tx, { ...notices, now }, id, user.id);
    await insertAuditEntry(tx, {
      actorId: user.id, action: 'window.transition', entity: 'window', entityId: id, at: now,
      before: { status: w.status, version: w.version },
      after: { status: body.to, version, reason: body.reason ?? null },
    });
  });
}
