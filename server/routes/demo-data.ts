// GET /api/demo-data (what removing the demo would take) and DELETE /api/demo-data (remove it, in one
// transaction, after the explicit confirmation). Admins only; tenant users get 404 as for any staff-only route.
import express, { type Router } from 'express';
import { demoIdentity, readDemoFile, type DemoIdentity } from '../../db/seed/demo-identity';
import { demoDataSummarySchema, demoRemovalRequestSchema, demoRemovalResultSchema } from '../../shared/demo-data';
import { ADMIN_ROLES } from '../../shared/permissions';
import { currentUser, staffOnlyRoute } from '../auth/guards';
import { removeDemoData, summariseDemoData } from '../services/demo-data/remove-demo-data';
import type { RouteDeps } from './deps';

let cachedDemo: DemoIdentity | null = null;

/** The demo's ids from scenarios/demo.json, read once per process (the file does not change while it runs). */
function loadDemoIdentity(): DemoIdentity {
  cachedDemo ??= demoIdentity(readDemoFile());
  return cachedDemo;
}

export function demoDataRouter({ db, now }: RouteDeps, demo: () => DemoIdentity = loadDemoIdentity): Router {
  const router = express.Router();
  router.use(...staffOnlyRoute(...ADMIN_ROLES));
  router.get('/', async (req, res) => {
    res.json(demoDataSummarySchema.parse(await summariseDemoData(db, demo(), currentUser(req).id)));
  });
  router.delete('/', async (req, res) => {
    demoRemovalRequestSchema.parse(req.body ?? {});
    const result = await removeDemoData(db, demo(), { callerId: currentUser(req).id, now: now() });
    res.json(demoRemovalResultSchema.parse(result));
  });
  return router;
}
