// GET /api/spans, /api/spans/:id: every signed-in role; a tenant user sees only the spans its ties cross.
import express, { type Router } from 'express';
import { inventoryIdParamSchema, spanDetailSchema, spanListQuerySchema, spanListSchema } from '../../shared/inventory';
import { tenantScopeOf } from '../../shared/permissions';
import { currentUser, requireAuth } from '../auth/guards';
import { inventoryView } from '../services/inventory/inventory-cache';
import { getSpanDetail, listSpans } from '../services/inventory/span-rows';
import type { RouteDeps } from './deps';

export function spansRouter({ db }: RouteDeps): Router {
  const router = express.Router();
  router.get('/', requireAuth, async (req, res) => {
    const query = spanListQuerySchema.parse(req.query);
    const view = await inventoryView(db, tenantScopeOf(currentUser(req)));
    res.json(spanListSchema.parse(listSpans(view, query)));
  });
  router.get('/:id', requireAuth, async (req, res) => {
    const view = await inventoryView(db, tenantScopeOf(currentUser(req)));
    res.json(spanDetailSchema.parse(getSpanDetail(view, inventoryIdParamSchema.parse(req.params).id)));
  });
  return router;
}
