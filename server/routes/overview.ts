// GET /api/overview: headline figures; a tenant-only user gets its own footprint (see queries/overview.ts).
import express, { type Router } from 'express';
import { overviewSchema, type Me } from '../../shared/api';
import { requireAuth } from '../auth/guards';
import { getNetworkOverview, getTenantOverview } from '../queries/overview';
import type { RouteDeps } from './deps';

/** Any staff role already opens network-wide data elsewhere, so only tenant-only users are scoped. */
function tenantScope(user: Me): string | null {
  const staff = user.roles.some((role) => role !== 'tenant');
  if (staff || !user.roles.includes('tenant')) return null;
  // A tenant user without a tenant sees nothing rather than everything.
  return user.tenantId ?? '';
}

export function overviewRouter({ db, now }: RouteDeps): Router {
  const router = express.Router();
  router.get('/', requireAuth, async (req, res) => {
    const tenantId = tenantScope(req.user!);
    const overview = tenantId === null
      ? await getNetworkOverview(db, { now: now() })
      : await getTenantOverview(db, { tenantId, now: now() });
    res.json(overviewSchema.parse(overview));
  });
  return router;
}
