// GET /api/overview: headline figures; a tenant-only user gets its own footprint (see queries/overview.ts).
import express, { type Router } from 'express';
import { overviewSchema } from '../../shared/api';
import { tenantScopeOf } from '../../shared/permissions';
import { currentUser, requireAuth } from '../auth/guards';
import { getNetworkOverview, getTenantOverview } from '../queries/overview/overview-figures';
import type { RouteDeps } from './deps';

export function overviewRouter({ db, now }: RouteDeps): Router {
  const router = express.Router();
  router.get('/', requireAuth, async (req, res) => {
    const tenantId = tenantScopeOf(currentUser(req));
    const overview = tenantId === null
      ? await getNetworkOverview(db, { now: now() })
      : await getTenantOverview(db, { tenantId, now: now() });
    res.json(overviewSchema.parse(overview));
  });
  return router;
}
