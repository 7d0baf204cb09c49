// /api/plans/:planId: read a move plan (plan readers), cancel or accept it (planners). Tenants see nothing of
// plans (404, as if the route did not exist); other staff without the role get 403. A window's runs are under
// /api/windows/:id/plans (routes/windows/plans.ts).
import express, { type Request, type Router } from 'express';
import { PLAN_READER_ROLES, PLAN_RUNNER_ROLES } from '../../shared/permissions';
import { planAcceptSchema, planResponseSchema } from '../../shared/plans';
import { currentUser, staffOnlyRoute } from '../auth/guards';
import { acceptPlan } from '../services/plans/accept-plan';
import { cancelPlan } from '../services/plans/cancel-plan';
import { getPlan } from '../services/plans/plan-reads';
import type { RouteDeps } from './deps';

const runners = staffOnlyRoute(...PLAN_RUNNER_ROLES);
const readers = staffOnlyRoute(...PLAN_READER_ROLES);
const planIdOf = (req: Request) => String(req.params.planId);

export function plansRouter({ db, now, jobs }: RouteDeps): Router {
  const router = express.Router();
  const answer = async (planId: string) => planResponseSchema.parse({ plan: await getPlan(db, planId) });

  router.get('/:planId', ...readers, async (req, res) => {
    res.json(await answer(planIdOf(req)));
  });
  router.post('/:planId/cancel', ...runners, async (req, res) => {
    await cancelPlan({ db, jobs, now: now() }, planIdOf(req), currentUser(req));
    res.json(await answer(planIdOf(req)));
  });
  router.post('/:planId/accept', ...runners, async (req, res) => {
    await acceptPlan({ db, now: now() }, planIdOf(req), planAcceptSchema.parse(req.body ?? {}), currentUser(req));
    res.json(await answer(planIdOf(req)));
  });
  return router;
}
