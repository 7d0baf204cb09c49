// GET /api/windows/:id/history (staff): the window's dated events — who did what, when, with their comments.
import express, { type Request, type Router } from 'express';
import { OPERATOR_ROLES } from '../../../shared/permissions';
import { windowHistorySchema } from '../../../shared/window-history';
import { hideFromTenants, requireRole } from '../../auth/guards';
import { WindowNotFoundError } from '../../services/windows/errors';
import { windowHistory } from '../../services/windows/window-history';
import type { RouteDeps } from '../deps';

const idOf = (req: Request) => String(req.params.id);
/** The history names staff, plan runs and sign-off comments: for a tenant user the window is not found. */
const staffOnly = hideFromTenants((req) => new WindowNotFoundError(idOf(req)));

export function windowHistoryRouter({ db }: RouteDeps): Router {
  const router = express.Router();
  router.get('/:id/history', staffOnly, requireRole(...OPERATOR_ROLES), async (req, res) => {
    res.json(windowHistorySchema.parse(await windowHistory(db, idOf(req))));
  });
  return router;
}
