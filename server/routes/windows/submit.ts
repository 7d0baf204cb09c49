// POST /api/windows/:id/submit (planner): hands a window's accepted plan to the change board for sign-off.
import express, { type Request, type Router } from 'express';
import { SIGNOFF_SUBMITTER_ROLES } from '../../../shared/permissions';
import { signoffSubmitResultSchema } from '../../../shared/signoff';
import { currentUser, hideFromTenants, requireRole } from '../../auth/guards';
import { requestWarnLog } from '../../http/request-log';
import { submitForSignoff } from '../../services/signoff/submit';
import { WindowNotFoundError } from '../../services/windows/errors';
import type { RouteDeps } from '../deps';

const idOf = (req: Request) => String(req.params.id);
/** Tenant users never learn whether a sign-off exists: the window is simply not found (404, not 403). */
const windowHidden = hideFromTenants((req) => new WindowNotFoundError(idOf(req)));

export function windowSubmitRouter(deps: RouteDeps): Router {
  const router = express.Router();
  router.post('/:id/submit', windowHidden, requireRole(...SIGNOFF_SUBMITTER_ROLES), async (req, res) => {
    const result = await submitForSignoff({ ...deps, now: deps.now(), log: requestWarnLog(req) }, idOf(req), currentUser(req));
    res.json(signoffSubmitResultSchema.parse(result));
  });
  return router;
}
