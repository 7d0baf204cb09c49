// /api/signoff: the approver's queue, a window's one-screen summary, decisions, and an admin's reset of a user's
// one-time codes; plus POST /api/windows/:id/submit (planner), mounted beside the windows router.
import express, { type Request, type Router } from 'express';
import { signoffDecisionBodySchema, signoffDecisionResultSchema, signoffQueueSchema, signoffSubmitResultSchema, signoffSummarySchema } from '../../shared/signoff';
import { hideFromTenants, requireRole } from '../auth/guards';
import { removeOtp } from '../auth/otp-keys';
import { decideSignoff } from '../services/signoff/decide';
import { submitForSignoff } from '../services/signoff/submit';
import { signoffQueue, signoffSummary } from '../services/signoff/summary';
import { WindowNotFoundError } from '../services/windows/errors';
import { STAFF_ROLES } from '../services/windows/tenant-scope';
import type { RouteDeps } from './deps';

const windowIdOf = (req: Request, param = 'windowId') => String(req.params[param]);

/** Tenant users never learn whether a sign-off exists: the window is simply not found (404, not 403). */
const windowHidden = (param: string) => hideFromTenants((req) => new WindowNotFoundError(windowIdOf(req, param)));

export function signoffRouter(deps: RouteDeps): Router {
  const { db, now } = deps;
  const router = express.Router();
  const hide = windowHidden('windowId');
  router.get('/queue', requireRole('approver', 'admin'), async (req, res) => {
    res.json(signoffQueueSchema.parse(await signoffQueue(db, req.user!)));
  });
  router.get('/:windowId', hide, requireRole(...STAFF_ROLES), async (req, res) => {
    res.json(signoffSummarySchema.parse(await signoffSummary(db, windowIdOf(req), req.user!)));
  });
  router.post('/:windowId/decision', hide, requireRole('approver'), async (req, res) => {
    const body = signoffDecisionBodySchema.parse(req.body);
    const result = await decideSignoff({ ...deps, now: now() }, windowIdOf(req), req.user!, body);
    res.json(signoffDecisionResultSchema.parse(result));
  });
  // A lost phone: an admin removes the user's key so they can enrol again (audited with the admin as actor).
  router.delete('/otp-keys/:userId', requireRole('admin'), async (req, res) => {
    await db.transaction((tx) => removeOtp(tx, String(req.params.userId), req.user!.id, now()));
    res.status(204).end();
  });
  return router;
}

/** POST /api/windows/:id/submit; mounted at /windows after the windows router, which has no such route. */
export function signoffSubmitRouter(deps: RouteDeps): Router {
  const router = express.Router();
  router.post('/:id/submit', windowHidden('id'), requireRole('planner'), async (req, res) => {
    const result = await submitForSignoff({ ...deps, now: deps.now() }, windowIdOf(req, 'id'), req.user!);
    res.json(signoffSubmitResultSchema.parse(result));
  });
  return router;
}
