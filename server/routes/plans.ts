// Move plans: /api/windows/:id/plans (run, list) and /api/plans/:planId (read, cancel, accept).
import express, { type Request, type Router } from 'express';
import { planAcceptSchema, planListResponseSchema, planResponseSchema, planSettingsSchema } from '../../shared/plans';
import { acceptPlan } from '../services/plans/accept-plan';
import { cancelPlan } from '../services/plans/cancel-plan';
import { enqueuePlan } from '../services/plans/enqueue-plan';
import { PLAN_READERS, PLAN_WRITERS, planAccess } from '../services/plans/plan-access';
import { getPlan, listWindowPlans } from '../services/plans/plan-reads';
import type { RouteDeps } from './deps';

const writers = planAccess(PLAN_WRITERS);
const readers = planAccess(PLAN_READERS);
const windowIdOf = (req: Request) => String(req.params.id);
const planIdOf = (req: Request) => String(req.params.planId);

export function plansRouter({ db, now, jobs, config }: RouteDeps): Router {
  const router = express.Router();
  const answer = async (planId: string) => planResponseSchema.parse({ plan: await getPlan(db, planId) });

  router.post('/windows/:id/plans', ...writers, async (req, res) => {
    const settings = planSettingsSchema.parse(req.body ?? {});
    const id = await enqueuePlan({ db, jobs, config, now: now() }, windowIdOf(req), settings, req.user!);
    res.status(202).json(await answer(id));
  });
  router.get('/windows/:id/plans', ...readers, async (req, res) => {
    res.json(planListResponseSchema.parse({ plans: await listWindowPlans(db, windowIdOf(req)) }));
  });
  router.get('/plans/:planId', ...readers, async (req, res) => {
    res.json(await answer(planIdOf(req)));
  });
  router.post('/plans/:planId/cancel', ...writers, async (req, res) => {
    await cancelPlan({ db, jobs, now: now() }, planIdOf(req), req.user!);
    res.json(await answer(planIdOf(req)));
  });
  router.post('/plans/:planId/accept', ...writers, async (req, res) => {
    await acceptPlan({ db, now: now() }, planIdOf(req), planAcceptSchema.parse(req.body ?? {}), req.user!);
    res.json(await answer(planIdOf(req)));
  });
  return router;
}
