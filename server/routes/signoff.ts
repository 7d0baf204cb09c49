// /api/signoff: the approver's queue, how many windows wait for them, what they decided, a window's one-screen
// summary, decisions, and an admin's reset of a user's one-time codes. Submitting a window for sign-off is POST /api/windows/:id/submit (routes/windows/submit.ts).
import express, { type Request, type Router } from 'express';
import { ADMIN_ROLES, canSignOff, OPERATOR_ROLES, SIGNOFF_APPROVER_ROLES, SIGNOFF_QUEUE_ROLES } from '../../shared/permissions';
import { DECIDED_BY_ME_LIMIT, decidedByMeSchema, signoffWaitingCountSchema } from '../../shared/signoff-mine';
import { signoffDecisionBodySchema, signoffDecisionResultSchema, signoffQueueSchema, signoffSummarySchema } from '../../shared/signoff';
import { currentUser, hideFromTenants, requireRole } from '../auth/guards';
import { removeOtp } from '../auth/otp-keys';
import { requestWarnLog } from '../http/request-log';
import { countWindowsWaitingFor } from '../queries/signoff/my-decisions';
import { decideSignoff } from '../services/signoff/decide';
import { decidedByMe } from '../services/signoff/decided-by-me';
import { signoffQueue, signoffSummary } from '../services/signoff/summary';
import { WindowNotFoundError } from '../services/windows/errors';
import type { RouteDeps } from './deps';

const windowIdOf = (req: Request) => String(req.params.windowId);

/** Tenant users never learn whether a sign-off exists: the window is simply not found (404, not 403). */
const hide = hideFromTenants((req) => new WindowNotFoundError(windowIdOf(req)));

export function signoffRouter(deps: RouteDeps): Router {
  const { db, now } = deps;
  const router = express.Router();
  router.get('/queue', requireRole(...SIGNOFF_QUEUE_ROLES), async (req, res) => {
    res.json(signoffQueueSchema.parse(await signoffQueue(db, currentUser(req))));
  });
  // The tab badge and the overview panel: admins read the queue but decide nothing, so theirs is 0.
  router.get('/waiting-count', requireRole(...SIGNOFF_QUEUE_ROLES), async (req, res) => {
    const user = currentUser(req);
    res.json(signoffWaitingCountSchema.parse({ waiting: canSignOff(user.roles) ? await countWindowsWaitingFor(db, user.id) : 0 }));
  });
  router.get('/decided-by-me', requireRole(...SIGNOFF_APPROVER_ROLES), async (req, res) => {
    res.json(decidedByMeSchema.parse(await decidedByMe(db, currentUser(req).id, DECIDED_BY_ME_LIMIT)));
  });
  router.get('/:windowId', hide, requireRole(...OPERATOR_ROLES), async (req, res) => {
    res.json(signoffSummarySchema.parse(await signoffSummary(db, windowIdOf(req), currentUser(req))));
  });
  router.post('/:windowId/decision', hide, requireRole(...SIGNOFF_APPROVER_ROLES), async (req, res) => {
    const body = signoffDecisionBodySchema.parse(req.body);
    const result = await decideSignoff({ ...deps, now: now(), log: requestWarnLog(req) }, windowIdOf(req), currentUser(req), body);
    res.json(signoffDecisionResultSchema.parse(result));
  });
  // A lost phone: an admin removes the user's key so they can enrol again (audited with the admin as actor).
  router.delete('/otp-keys/:userId', requireRole(...ADMIN_ROLES), async (req, res) => {
    await db.transaction((tx) => removeOtp(tx, String(req.params.userId), currentUser(req).id, now()));
    res.status(204).end();
  });
  return router;
}
