// GET /api/sites, /api/sites/:id: every signed-in role; a tenant user sees only the sites its slices use.
import express, { type Router } from 'express';
import { inventoryIdParamSchema, siteDetailSchema, siteListQuerySchema, siteListSchema } from '../../shared/inventory';
import { tenantScopeOf } from '../../shared/permissions';
import { currentUser, requireAuth } from '../auth/guards';
import { inventoryView } from '../services/inventory/inventory-cache';
import { getSiteDetail, listSites } from '../services/inventory/site-rows';
import type { RouteDeps } from './deps';

export function sitesRouter({ db }: RouteDeps): Router {
  const router = express.Router();
  router.get('/', requireAuth, async (req, res) => {
    const query = siteListQuerySchema.parse(req.query);
    const view = await inventoryView(db, tenantScopeOf(currentUser(req)));
    res.json(siteListSchema.parse(listSites(view, query)));
  });
  router.get('/:id', requireAuth, async (req, res) => {
    const view = await inventoryView(db, tenantScopeOf(currentUser(req)));
    res.json(siteDetailSchema.parse(getSiteDetail(view, inventoryIdParamSchema.parse(req.params).id)));
  });
  return router;
}
