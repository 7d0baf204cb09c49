// POST and GET /api/windows/:id/plans: start a move-plan run (planner) and list a window's runs (plan readers).
// Tenants see nothing of plans (404, as if the route did not exist); other staff without the role get 403.
import express, { type Request, type Router } from 'express';
import { PLAN_READER_ROLES, PLAN_RUNNER_ROLES } from '../../../shared/permissions';
import { planListResponseSchema, planResponseSchema, planSettingsSchema } from '../../../shared/plans';
import { currentUser, staffOnlyRoute } from '../../auth/guards';
import { enqueuePlan } from '../../services/plans/enqueue-plan';
import { getPlan, listWindowPlans } from '../../services/plans/plan-reads';
import type { RouteDeps } from '../deps';

const windowIdOf = (req: Request) => String(req.params.id);

export function windowPlansRouter({ db, now, jobs, config }: RouteDeps): Router {
  const router = express.Router();
  router.post('/:id/plans', ...staffOnlyRoute(...PLAN_RUNNER_ROLES), async (req, res) => {
    const settings = planSettingsSchema.parse(req.body ?? {});
    const id = await enqueuePlan({ db, jobs, config, now: now() }, windowIdOf(req), settings, currentUser(req));
    res.status(202).json(planResponseSchema.parse({ plan: await getPlan(db, id) }));
  });
  router.get('/:id/plans', ...staffOnlyRoute(...PLAN_READER_ROLES), async (req, res) => {
    res.json(planListResponseSchema.parse({ plans: await listWindowPlans(db, windowIdOf(req)) }));
  });
  return router;
}
