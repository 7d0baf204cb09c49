// An approver's decision: approve (the quorum clears the window and issues notices) or send back (returned at once).
import type { Me } from '../../../shared/api';
import type { SignoffDecisionBody, SignoffDecisionResult } from '../../../shared/signoff';
import { OtpCodeRequiredError } from '../../auth/otp-errors';
import { withOtpAttempt } from '../../auth/otp-attempts';
import { spendOtpCode } from '../../auth/otp-keys';
import { insertAuditEntry } from '../../queries/audit/audit-log';
import { insertSignoffDecision, countApprovals, hasDecided } from '../../queries/signoff/signoff-decisions';
import { getUsersByIds } from '../../queries/auth/users';
import { getPolicies } from '../../queries/windows/policies';
import { selectWindowState } from '../../queries/windows/window-status';
import type { Queryable, Tx } from '../../../db/client';
import { issueNotices } from '../notices/issue-notices';
import { setWindowStatus } from '../windows/set-window-status';
import { AlreadyDecidedError, NoAcceptedPlanError, NotInReviewError, SelfSignoffError } from './errors';
import { isOwnWork, loadSignoffContext, quorumFor, riskOfContext, type SignoffContext } from './signoff-context';
import { queueMails, sendBackMail } from './signoff-mail';
import { logOf, type SignoffDeps } from './submit';

/** A code is checked whenever one is given; without one, only a policy that requires codes refuses. */
async function confirmWithCode(tx: Queryable, requireCode: boolean, userId: string, code: string | undefined, at: Date): Promise<boolean> {
  if (code === undefined) {
    if (requireCode) throw new OtpCodeRequiredError();
    return false;
  }
  await spendOtpCode(tx, userId, code, at);
  return true;
}

type Recorded = SignoffDecisionResult & { ctx: SignoffContext };

async function record(tx: Tx, deps: SignoffDeps, windowId: string, user: Me, body: SignoffDecisionBody): Promise<Recorded> {
  const ctx = await loadSignoffContext(tx, windowId, true);
  if (ctx.window.status !== 'in-review') throw new NotInReviewError(ctx.window.status);
  if (!ctx.plan) throw new NoAcceptedPlanError();
  if (isOwnWork(user.id, ctx)) throw new SelfSignoffError();
  const round = ctx.window.reviewRound;
  if (await hasDecided(tx, windowId, round, user.id)) throw new AlreadyDecidedError();
  const policies = await getPolicies(tx);
  const codeConfirmed = await confirmWithCode(tx, policies.signoffRequireCode, user.id, body.code, deps.now);
  const decision = { windowId, round, planId: ctx.plan.id, approverId: user.id, decision: body.decision, comment: body.comment, codeConfirmed };
  await insertSignoffDecision(tx, { ...decision, decidedAt: deps.now });
  await insertAuditEntry(tx, { actorId: user.id, action: 'signoff.decision', entity: 'window', entityId: windowId, at: deps.now, after: decision });
  const quorum = quorumFor(policies, riskOfContext(ctx));
  const approvals = await countApprovals(tx, windowId, round);
  const change = { windowId, from: ['in-review'] as const, actorId: user.id, now: deps.now };
  if (body.decision === 'send-back') {
    await setWindowStatus(tx, { ...change, to: 'returned', action: 'signoff.send-back', details: { round, comment: body.comment } });
    return { status: 'returned', approvals, quorum, notices: null, ctx };
  }
  if (approvals < quorum) return { status: 'in-review', approvals, quorum, notices: null, ctx };
  await setWindowStatus(tx, { ...change, to: 'cleared', action: 'signoff.cleared', details: { round, approvals, quorum } });
  const notices = await issueNotices(tx, { jobs: deps.jobs, config: deps.config, now: deps.now }, windowId, user.id);
  // The row is locked since loadSignoffContext, so it is still there; issuing notices may have moved it on.
  const after = await selectWindowState(tx, windowId);
  return { status: after!.status, approvals, quorum, notices, ctx };
}

export async function decideSignoff(deps: SignoffDeps, windowId: string, user: Me, body: SignoffDecisionBody): Promise<SignoffDecisionResult> {
  const decide = (tx: Tx) => record(tx, deps, windowId, user, body);
  // A decision carrying a code counts towards the wrong-code limit (a refused decision's changes roll back).
  const { ctx, ...result } = body.code ? await withOtpAttempt(deps.db, user.id, deps.now, decide) : await deps.db.transaction(decide);
  if (result.status === 'returned') {
    // The planner who accepted the plan and the window's owner hear of it, with the approver's words.
    const people = await getUsersByIds(deps.db, [ctx.plan?.acceptedBy ?? null, ctx.window.ownerId]);
    const log = logOf(deps);
    await queueMails(deps.jobs, (to) => sendBackMail(deps.config, ctx.window, user.name, body.comment, to),
      [...people.values()].map((p) => p.email), (err) => log(`send-back mail for ${windowId} not queued`, err));
  }
  return result;
}
