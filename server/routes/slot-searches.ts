// /api/slot-searches: start a slot search (engineers, planners, admins) and read one while it runs and once done.
// Searches are not secret: any of those roles reads anyone's. Tenants see nothing (404, as if the route did not
// exist); other staff without the role get 403.
import express, { type Request, type Router } from 'express';
import { SLOT_SEARCH_ROLES } from '../../shared/permissions';
import { createdIdSchema, slotSearchCreateSchema, slotSearchSchema } from '../../shared/slots';
import { currentUser, staffOnlyRoute } from '../auth/guards';
import type { SlotEngine } from '../services/campaigns/engine';
import { slotEngine } from '../services/campaigns/slot-engine';
import { getSlotSearch, startSlotSearch } from '../services/campaigns/slot-searches';
import type { RouteDeps } from './deps';

const searchers = staffOnlyRoute(...SLOT_SEARCH_ROLES);
const idOf = (req: Request) => String(req.params.id);

export function slotSearchesRouter({ db, now, jobs, config, engine = slotEngine }: RouteDeps & { engine?: SlotEngine }): Router {
  const router = express.Router();
  router.post('/', ...searchers, async (req, res) => {
    const request = slotSearchCreateSchema.parse(req.body ?? {});
    const id = await startSlotSearch({ db, jobs, engine, limits: config.waitingJobLimits, now: now() }, request, currentUser(req));
    res.status(201).json(createdIdSchema.parse({ id }));
  });
  router.get('/:id', ...searchers, async (req, res) => {
    res.json(slotSearchSchema.parse(await getSlotSearch(db, idOf(req))));
  });
  return router;
}
