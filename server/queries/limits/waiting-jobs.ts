// Counts one person's unfinished background jobs of one kind: the rows still `queued` or `running` that they
// started (slot searches, campaigns being planned, move-plan runs).
import { and, count, eq, inArray } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { campaigns, plans, slotSearches } from '../../../db/schema';
import type { WaitingJobKind } from '../../../shared/job-limits';

const UNFINISHED = ['queued', 'running'] as const;

async function countSearches(db: Queryable, userId: string): Promise<number> {
  const [row] = await db.select({ n: count() }).from(slotSearches)
    .where(and(eq(slotSearches.createdBy, userId), inArray(slotSearches.status, [...UNFINISHED])));
  return row.n;
}

async function countPlanningCampaigns(db: Queryable, userId: string): Promise<number> {
  const [row] = await db.select({ n: count() }).from(campaigns)
    .where(and(eq(campaigns.createdBy, userId), inArray(campaigns.status, [...UNFINISHED])));
  return row.n;
}

async function countPlanRuns(db: Queryable, userId: string): Promise<number> {
  const [row] = await db.select({ n: count() }).from(plans)
    .where(and(eq(plans.createdBy, userId), inArray(plans.status, [...UNFINISHED])));
  return row.n;
}

const COUNTERS: Record<WaitingJobKind, (db: Queryable, userId: string) => Promise<number>> = {
  slotSearches: countSearches,
  campaignPlans: countPlanningCampaigns,
  planRuns: countPlanRuns,
};

export function countUnfinishedJobs(db: Queryable, kind: WaitingJobKind, userId: string): Promise<number> {
  return COUNTERS[kind](db, userId);
}
