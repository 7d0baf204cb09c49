// Moves a window along its lifecycle (withdraw, start, finish, roll back) under optimistic locking.
import type { Db } from '../../../db/client';
import type { Me } from '../../../shared/api';
import type { WindowTransition } from '../../../shared/windows';
import { applyPlanPlacements } from '../plans/apply-placements';
import { withdrawNotices, type NoticeMailDeps } from '../notices/withdraw-notices';
import { IllegalTransitionError, StaleVersionError, TransitionGuardedError } from './errors';
import { checkTransition } from './lifecycle';
import { setWindowStatus } from './set-window-status';
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
    await setWindowStatus(tx, {
      windowId: id, version: body.version, to: body.to, actorId: user.id, action: 'window.transition', now,
      details: { reason: body.reason ?? null },
      // Starting the work puts the accepted plan's placements in force; finishing or rolling back may restore them.
      alongside: async () => {
        await applyPlanPlacements(tx, { windowId: id, from: w.status, to: body.to, actorId: user.id, now });
        if (body.to === 'withdrawn') await withdrawNotices(tx, { ...notices, now }, id, user.id);
      },
    });
  });
}
