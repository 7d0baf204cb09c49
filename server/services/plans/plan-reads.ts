// Reads plans in API shape: one run with its review, or a window's runs newest first.
import type { Plan, PlanListItem } from '../../../shared/plans';
import type { Queryable } from '../../../db/client';
import { selectPlanRow, selectPlanRowsByWindow } from '../../queries/plans/plan-rows';
import { PlanNotFoundError } from './errors';
import { loadWindowFacts, toPlan, toPlanListItem } from './plan-view';

export async function getPlan(db: Queryable, planId: string): Promise<Plan> {
  const row = await selectPlanRow(db, planId);
  if (!row) throw new PlanNotFoundError(planId);
  return toPlan(row, await loadWindowFacts(db, row.windowId));
}

export async function listWindowPlans(db: Queryable, windowId: string): Promise<PlanListItem[]> {
  const facts = await loadWindowFacts(db, windowId);
  return (await selectPlanRowsByWindow(db, windowId)).map((row) => toPlanListItem(row, facts));
}
