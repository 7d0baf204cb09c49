// Small hand-built campaign problems for the scheduler's tests: one slot per night, 23:00–02:00 UTC.
import type { CampaignGroupInput, CampaignProblem, CampaignSlotOption } from '../../../planner/campaign/schedule-campaign';

export const FIRST_NIGHT = '2026-12-01';

export function nightOf(i: number): string {
  return new Date(Date.UTC(2026, 11, 1 + i)).toISOString().slice(0, 10);
}

/** One slot on each of nights 0 … costs.length - 1, costing costs[i] points. */
export function nightlySlots(costs: number[], { startHour = 23, hours = 3 } = {}): CampaignSlotOption[] {
  return costs.map((cost, i) => {
    const startMs = Date.UTC(2026, 11, 1 + i, startHour);
    return { startMs, endMs: startMs + hours * 3_600_000, night: nightOf(i), cost };
  });
}

export function problem(groups: CampaignGroupInput[], maxPerNight: number, minDaysBetweenTouches: number,
  clashes: Array<[number, number]> = []): CampaignProblem {
  return { groups, rules: { maxPerNight, minDaysBetweenTouches }, clashes };
}

export function dayGap(a: string, b: string): number {
  return Math.abs(Date.parse(`${a}T00:00:00Z`) - Date.parse(`${b}T00:00:00Z`)) / 86_400_000;
}
