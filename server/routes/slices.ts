// GET /api/slices, /api/slices/:id: every signed-in role; a tenant user sees only its own slices (others → 404).
import express, { type Router } from 'express';
import { inventoryIdParamSchema, sliceDetailSchema, sliceListQuerySchema, sliceListSchema } from '../../shared/inventory';
import { tenantScopeOf } from '../../shared/permissions';
import { currentUser, requireAuth } from '../auth/guards';
import { inventoryView } from '../services/inventory/inventory-cache';
import { getSliceDetail } from '../services/inventory/slice-detail';
import { listSlices } from '../services/inventory/slice-rows';
import type { RouteDeps } from './deps';

export function slicesRouter({ db }: RouteDeps): Router {
  const router = express.Router();
  router.get('/', requireAuth, async (req, res) => {
    const query = sliceListQuerySchema.parse(req.query);
    const view = await inventoryView(db, tenantScopeOf(currentUser(req)));
    res.json(sliceListSchema.parse(listSlices(view, query)));
  });
  router.get('/:id', requireAuth, async (req, res) => {
    const view = await inventoryView(db, tenantScopeOf(currentUser(req)));
    res.json(sliceDetailSchema.parse(await getSliceDetail(db, view, inventoryIdParamSchema.parse(req.params).id)));
  });
  return router;
}
