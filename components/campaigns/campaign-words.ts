// How a campaign reads: its state in words, its windows grouped by night, the cost figures and refusals.
import type { Campaign, CampaignStatus, CampaignWindow } from '@/shared/slots';
import { isApiError } from '@/hooks/api-fetch';
import { NETWORK_TIME_ZONE } from '@/shared/time-zone';
import { startOfDayMs } from '@/shared/zone-clock';

export const CAMPAIGN_STATUS_LABELS: Record<CampaignStatus, string> = {
  queued: 'Waiting to run', running: 'Scheduling', draft: 'Draft', booked: 'Booked', failed: 'Failed', discarded: 'Discarded',
};

/** Costs are the slot finder's ranking points (lower is better); one decimal is as fine as they mean anything. */
export function formatPoints(cost: number | null): string {
  if (cost === null) return '–';
  return `${(Math.round(cost * 10) / 10).toLocaleString('en-GB')} points`;
}

/** "Thursday 7 January 2027": a night as the network's zone names it. */
export function nightLabel(night: string): string {
  return new Intl.DateTimeFormat('en-GB', { weekday: 'long', day: 'numeric', month: 'long', year: 'numeric', timeZone: NETWORK_TIME_ZONE })
    .format(new Date(startOfDayMs(night, NETWORK_TIME_ZONE))).replace(',', '');
}

export type Night = { night: string; windows: CampaignWindow[] };

/** The draft's windows by night, nights in order and windows by start inside each. */
export function windowsByNight(windows: readonly CampaignWindow[]): Night[] {
  const byNight = new Map<string, CampaignWindow[]>();
  for (const w of windows) byNight.set(w.night, [...(byNight.get(w.night) ?? []), w]);
  return [...byNight.entries()]
    .sort(([a], [b]) => a.localeCompare(b))
    .map(([night, list]) => ({ night, windows: list.sort((a, b) => Date.parse(a.start) - Date.parse(b.start) || a.group - b.group) }));
}

/**
 * What the local search gained over the constructive start: more groups fitted in first (a window more is worth far
 * more than points saved), otherwise the points saved.
 */
export function gainText(c: Pick<Campaign, 'totalCost' | 'startCost' | 'startScheduled' | 'windows'>): string | null {
  if (c.totalCost === null || c.startCost === null) return null;
  const more = c.startScheduled === null ? 0 : c.windows.length - c.startScheduled;
  if (more > 0) {
    return `The search fitted in ${more} more ${more === 1 ? 'window' : 'windows'} than the first schedule found `
      + `(${c.startScheduled} ${c.startScheduled === 1 ? 'window' : 'windows'}, ${formatPoints(c.startCost)}).`;
  }
  const gain = c.startCost - c.totalCost;
  if (gain <= 0) return `The first schedule found was already the best (${formatPoints(c.startCost)}).`;
  return `${formatPoints(gain)} less than the first schedule found (${formatPoints(c.startCost)}).`;
}

/** A refused move or booking in words: every broken rule on its own line, or why the draft must be reloaded. */
export function refusalLines(error: unknown): string[] {
  if (!error) return [];
  if (isApiError(error) && error.code === 'STALE_VERSION') {
    return ['Someone changed this draft since you opened it. It has been reloaded; look again and repeat your change.'];
  }
  const message = error instanceof Error ? error.message : String(error);
  if (isApiError(error) && error.code === 'CAMPAIGN_RULES') {
    // The server joins the broken rules, each a sentence, with spaces.
    const lines = message.split(/(?<=[.!?])\s+(?=[A-Z“"])/).map((l) => l.trim()).filter(Boolean);
    return lines.length > 0 ? lines : [message];
  }
  return [message];
}
