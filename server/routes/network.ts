// GET /api/network/map: sites, spans and their utilisation over the outline; scoped to its footprint for a tenant user.
import express, { type Router } from 'express';
import { networkMapSchema } from '../../shared/inventory';
import { tenantScopeOf } from '../../shared/permissions';
import { currentUser, requireAuth } from '../auth/guards';
import { inventoryView } from '../services/inventory/inventory-cache';
import { getNetworkMap } from '../services/inventory/network-map';
import type { RouteDeps } from './deps';

export function networkRouter({ db }: RouteDeps): Router {
  const router = express.Router();
  router.get('/map', requireAuth, async (req, res) => {
    const view = await inventoryView(db, tenantScopeOf(currentUser(req)));
    res.json(networkMapSchema.parse(getNetworkMap(view)));
  });
  return router;
}
