// The approver's one-screen summary of a window's accepted plan, and the queue of windows awaiting decisions.
import type { Db } from '../../../db/client';
import type { Me } from '../../../shared/api';
import { canSignOff } from '../../../shared/permissions';
import type { SignoffQueue, SignoffQueueItem, SignoffSummary } from '../../../shared/signoff';
import { selectTenantNames } from '../../queries/signoff/element-names';
import { countApprovals, hasDecided } from '../../queries/signoff/signoff-decisions';
import { selectWindowIdsInReview } from '../../queries/signoff/signoff-window';
import { getUsersByIds } from '../../queries/auth/users';
import { getPolicies } from '../../queries/windows/policies';
import { getWindowDocument } from '../../queries/windows/documents';
import { selectElementsByWindow } from '../../queries/windows/window-rows';
import { getWindowImpact } from '../../queries/windows/impacts';
import { touchCounts } from '../../../shared/touch-counts';
import type { Queryable } from '../../../db/client';
import { SignoffNotFoundError } from './errors';
import { isOwnWork, listDecisions, loadSignoffContext, quorumFor, riskOfContext, type SignoffContext } from './signoff-context';
import { highestRisks, impactTouches, knockOnMoves, namedElements, planTotals, tenantCounts, unresolvedSlices } from './summary-parts';

type My = SignoffSummary['me'];

async function myState(db: Queryable, ctx: SignoffContext, user: Me): Promise<My> {
  const decided = await hasDecided(db, ctx.window.id, ctx.window.reviewRound, user.id);
  // Having decided says more to the approver than the window having moved on since.
  const blocked: My['blocked'] = !canSignOff(user.roles) ? 'role'
    : decided ? 'decided'
      : ctx.window.status !== 'in-review' ? 'closed'
        : isOwnWork(user.id, ctx) ? 'self' : null;
  return { decided, blocked };
}

const person = (p: { id: string; name: string } | undefined) => (p ? { id: p.id, name: p.name } : null);

/** Reads on the pool (`Db`, never a transaction): its look-ups run side by side, which one connection refuses. */
export async function signoffSummary(db: Db, windowId: string, user: Me): Promise<SignoffSummary> {
  const ctx = await loadSignoffContext(db, windowId);
  const plan = ctx.plan;
  if (!plan) throw new SignoffNotFoundError(windowId);
  const w = ctx.window;
  const [policies, elements, doc, people, decisions, approvals, me, impact] = await Promise.all([
    getPolicies(db), selectElementsByWindow(db, [w.id]), getWindowDocument(db, w.id),
    getUsersByIds(db, [w.ownerId, plan.acceptedBy]), listDecisions(db, w.id), countApprovals(db, w.id, w.reviewRound),
    myState(db, ctx, user), getWindowImpact(db, w.id),
  ]);
  const touched = impactTouches(impact, plan.windowVersion);
  const tenantIds = [...plan.review.slices.map((s) => s.tenantId), ...(touched ?? []).map((s) => s.tenantId)];
  const names = await selectTenantNames(db, [...new Set(tenantIds)]);
  const riskClass = riskOfContext(ctx);
  return {
    window: {
      id: w.id, title: w.title, workType: w.workType, status: w.status, round: w.reviewRound,
      startsAt: w.startsAt.toISOString(), endsAt: w.endsAt.toISOString(), owner: person(people.get(w.ownerId ?? '')),
      elements: await namedElements(db, elements.get(w.id) ?? []),
    },
    plan: {
      id: plan.id, href: `/windows/${encodeURIComponent(w.id)}/plans/${encodeURIComponent(plan.id)}`,
      acceptedAt: plan.acceptedAt?.toISOString() ?? null, acceptedBy: person(people.get(plan.acceptedBy ?? '')),
    },
    tenants: tenantCounts(plan.review, touched, names),
    totals: planTotals(plan.review, touched),
    touch: touchCounts(touched, plan.review.slices),
    knockOn: knockOnMoves(plan.review, names),
    unresolved: unresolvedSlices(plan.review, names, plan.outageAccepted),
    riskClass, highestRisks: highestRisks(plan.review),
    criticalSlices: plan.review.slices.filter((s) => s.critical).length,
    mop: doc ? { fileName: doc.fileName, href: `/api/windows/${encodeURIComponent(w.id)}/mop` } : null,
    quorum: quorumFor(policies, riskClass), approvals, requireCode: policies.signoffRequireCode,
    decisions, me,
  };
}

async function queueItem(db: Queryable, windowId: string, user: Me, quorum: (ctx: SignoffContext) => number): Promise<SignoffQueueItem> {
  const ctx = await loadSignoffContext(db, windowId);
  const w = ctx.window;
  return {
    windowId: w.id, title: w.title, startsAt: w.startsAt.toISOString(), endsAt: w.endsAt.toISOString(),
    workType: w.workType, round: w.reviewRound, riskClass: riskOfContext(ctx),
    critical: ctx.plan?.review.slices.some((s) => s.critical) ?? false,
    quorum: quorum(ctx), approvals: await countApprovals(db, w.id, w.reviewRound), me: await myState(db, ctx, user),
  };
}

/** Windows in review, soonest first. A handful at a time in practice, so one look-up each is fine (on the pool). */
export async function signoffQueue(db: Db, user: Me): Promise<SignoffQueue> {
  const policies = await getPolicies(db);
  const ids = await selectWindowIdsInReview(db);
  const items = await Promise.all(ids.map((id) => queueItem(db, id, user, (ctx) => quorumFor(policies, riskOfContext(ctx)))));
  return { windows: items, requireCode: policies.signoffRequireCode };
}
