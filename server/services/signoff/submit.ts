// Submit for sign-off (planner): an accepted plan goes to the change board; every approver gets an e-mail.
import type { Me } from '../../../shared/api';
import type { SignoffSubmitResult } from '../../../shared/signoff';
import type { Db } from '../../../db/client';
import type { ServerConfig } from '../../env';
import { listUsersWithRole } from '../../queries/auth/users';
import type { MailQueue } from '../ports';
import { setWindowStatus } from '../windows/set-window-status';
import { NoAcceptedPlanError } from './errors';
import { loadSignoffContext, riskOfContext } from './signoff-context';
import { queueMails, signoffRequestMail } from './signoff-mail';

export type SignoffDeps = { db: Db; config: ServerConfig; jobs: MailQueue; now: Date; log?: (message: string, err: unknown) => void };

/** Where a mail that could not be queued is reported (the decision itself stands); the route passes the request's log. */
export const logOf = (deps: SignoffDeps) => deps.log ?? (() => undefined);

export async function submitForSignoff(deps: SignoffDeps, windowId: string, user: Me): Promise<SignoffSubmitResult> {
  const { window, round } = await deps.db.transaction(async (tx) => {
    const ctx = await loadSignoffContext(tx, windowId, true);
    if (ctx.window.status === 'planned' && !ctx.plan) throw new NoAcceptedPlanError();
    const next = ctx.window.reviewRound + 1;
    await setWindowStatus(tx, {
      windowId, from: ['planned'], to: 'in-review', actorId: user.id, action: 'signoff.submit', now: deps.now,
      set: { reviewRound: next }, details: { planId: ctx.plan?.id ?? null, round: next, riskClass: riskOfContext(ctx) },
    });
    return { window: ctx.window, round: next };
  });
  // After the commit: a mail must never announce a submission that was rolled back.
  const approvers = await listUsersWithRole(deps.db, 'approver');
  const log = logOf(deps);
  const approversMailed = await queueMails(
    deps.jobs, (to) => signoffRequestMail(deps.config, window, round, to), approvers.map((a) => a.email),
    (err) => log(`sign-off request for ${windowId} not queued`, err),
  );
  return { windowId, status: 'in-review', round, approversMailed };
}
