// A campaign row as the API answers it (shared/slots.ts campaignSchema): the draft's windows with their
// alternatives, the unscheduled groups and the costs.
import { campaignSchema, type Campaign, type CampaignWindow } from '../../../shared/slots';
import type { CampaignRow } from '../../queries/slots/campaign-rows';
import { storedScheduleSchema, totalCostOf, type CampaignRequest, type StoredSchedule } from './stored-schedule';

/** Other starts shown per window, best first: enough to move it, few enough to keep the calendar's list light. */
export const ALTERNATIVES_SHOWN = 40;

export function scheduleOf(row: Pick<CampaignRow, 'schedule'>): StoredSchedule | null {
  if (row.schedule === null) return null;
  return storedScheduleSchema.parse(row.schedule);
}

function windowsOf(s: StoredSchedule): CampaignWindow[] {
  const out: CampaignWindow[] = [];
  s.assignment.forEach((index, group) => {
    if (index === null) return;
    const g = s.groups[group];
    const slot = g.slots[index];
    const alternatives = g.slots.filter((_, i) => i !== index).slice(0, ALTERNATIVES_SHOWN)
      .map(({ start, end, night, cost }) => ({ start, end, night, cost }));
    out.push({
      group, label: g.label, elements: g.elements, start: slot.start, end: slot.end, night: slot.night, cost: slot.cost,
      touched: slot.touched, unresolved: slot.unresolved, criticalTouched: slot.criticalTouched,
      explanation: slot.explanation, alternatives,
    });
  });
  return out;
}

export function campaignView(row: CampaignRow): Campaign {
  const s = scheduleOf(row);
  const request = row.request as CampaignRequest;
  return campaignSchema.parse({
    id: row.id,
    title: row.title,
    status: row.status,
    version: row.version,
    progress: row.progress ?? null,
    request,
    windows: s ? windowsOf(s) : [],
    unscheduled: s
      ? s.assignment.flatMap((index, group) => (index !== null ? [] : [{
        group, label: s.groups[group].label, reason: s.unscheduledReasons[group] ?? 'No slot keeps the campaign’s rules.',
      }]))
      : [],
    totalCost: s ? totalCostOf(s) : null,
    startCost: s ? s.startCost : null,
    startScheduled: s?.startScheduled ?? null,
    bookedWindowIds: Array.isArray(row.bookedWindowIds) ? row.bookedWindowIds : [],
    error: row.error,
    createdBy: row.createdBy ? { id: row.createdBy, name: row.createdByName ?? 'a former user' } : null,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  });
}
