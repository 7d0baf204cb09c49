// GET /api/portal/work (tenant): the upcoming work that touches the signed-in tenant's slices.
import express, { type Router } from 'express';
import { portalWorkSchema } from '../../shared/notices';
import { TENANT_PORTAL_ROLES } from '../../shared/permissions';
import { NETWORK_TIME_ZONE } from '../../shared/time-zone';
import { currentUser, requireRole } from '../auth/guards';
import { portalWork } from '../services/notices/notice-views';
import type { RouteDeps } from './deps';

export function portalRouter({ db, now }: RouteDeps): Router {
  const router = express.Router();
  router.get('/work', requireRole(...TENANT_PORTAL_ROLES), async (req, res) => {
    // A tenant user without a tenant sees nothing. Times are listed in the viewer's zone (their choice, else the network's).
    const user = currentUser(req);
    res.json(portalWorkSchema.parse(await portalWork(db, { tenantId: user.tenantId ?? '', timeZone: user.timeZone ?? NETWORK_TIME_ZONE }, now())));
  });
  return router;
}
