// GET /api/overview: headline figures; a tenant-only user gets its own footprint and the work it was notified of.
import express, { type Router } from 'express';
import { overviewSchema } from '../../shared/api';
import { tenantScopeOf } from '../../shared/permissions';
import { tenantOverviewSchema } from '../../shared/tenant-windows';
import { currentUser, requireAuth } from '../auth/guards';
import { getNetworkOverview } from '../queries/overview/overview-figures';
import { tenantOverview } from '../services/notices/tenant-window-views';
import type { RouteDeps } from './deps';

export function overviewRouter({ db, now }: RouteDeps): Router {
  const router = express.Router();
  router.get('/', requireAuth, async (req, res) => {
    const tenantId = tenantScopeOf(currentUser(req));
    if (tenantId !== null) {
      res.json(tenantOverviewSchema.parse(await tenantOverview(db, tenantId, now())));
      return;
    }
    res.json(overviewSchema.parse(await getNetworkOverview(db, { now: now() })));
  });
  return router;
}
