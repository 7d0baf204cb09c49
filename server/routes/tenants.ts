// GET /api/tenants, /api/tenants/:id: every signed-in role; a tenant user sees only its own tenant.
import express, { type Router } from 'express';
import { inventoryIdParamSchema, tenantDetailSchema, tenantListQuerySchema, tenantListSchema } from '../../shared/inventory';
import { tenantScopeOf } from '../../shared/permissions';
import { currentUser, requireAuth } from '../auth/guards';
import { inventoryView } from '../services/inventory/inventory-cache';
import { getTenantDetail, listTenants } from '../services/inventory/tenant-rows';
import type { RouteDeps } from './deps';

export function tenantsRouter({ db }: RouteDeps): Router {
  const router = express.Router();
  router.get('/', requireAuth, async (req, res) => {
    const query = tenantListQuerySchema.parse(req.query);
    const view = await inventoryView(db, tenantScopeOf(currentUser(req)));
    res.json(tenantListSchema.parse(listTenants(view, query)));
  });
  router.get('/:id', requireAuth, async (req, res) => {
    const view = await inventoryView(db, tenantScopeOf(currentUser(req)));
    res.json(tenantDetailSchema.parse(getTenantDetail(view, inventoryIdParamSchema.parse(req.params).id)));
  });
  return router;
}
