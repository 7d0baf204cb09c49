// Fixtures for the slot finder and campaign tests: candidates, searches and campaigns shaped by the shared schemas.
import type { Campaign, CampaignWindow, SlotCandidate, SlotSearch } from '@/shared/slots';

export function candidate(extra: Partial<SlotCandidate> = {}): SlotCandidate {
  return {
    start: '2030-01-10T01:00:00.000Z', end: '2030-01-10T05:00:00.000Z', night: '2030-01-10', rank: 1, excluded: null,
    touched: 4, unresolved: 0, criticalTouched: 0, criticalUnresolved: 0,
    counts: { touched: 4, mustMove: 2, protectionLost: 2, unresolved: 0, knockOn: 0 },
    riskPercent: 0.4, riskLevel: 'Low', overlapping: [], conflicts: [], noticeSpareDays: 6, cost: 12, reused: false,
    explanation: 'Touches 4 slices, all kept; no other work that night.',
    ...extra,
  };
}

export function excluded(code: NonNullable<SlotCandidate['excluded']>['code'], start: string, reason: string): SlotCandidate {
  const end = new Date(Date.parse(start) + 4 * 3_600_000).toISOString();
  // The fixtures' slots begin after midnight in the network's zone (UTC−1), so the night is that local day.
  const night = new Date(Date.parse(start) - 3_600_000).toISOString().slice(0, 10);
  return candidate({ start, end, night, rank: null, excluded: { code, reason }, unresolved: null, explanation: reason });
}

export function search(extra: Partial<SlotSearch> = {}): SlotSearch {
  return {
    id: 's-1', status: 'done', progress: null,
    request: { sites: ['cell-pellow-sands'], spans: ['span-a-b'], durationHours: 4, from: '2030-01-08T01:00:00.000Z', to: '2030-01-29T06:00:00.000Z', hours: { start: '00:00', end: '05:00' }, stepMinutes: 60 },
    elements: [{ kind: 'site', id: 'cell-pellow-sands', name: 'Pellow Sands' }, { kind: 'span', id: 'span-a-b', name: 'Orrindale – Vellaport' }],
    candidates: [], summary: null, error: null, createdAt: '2030-01-01T10:00:00.000Z', finishedAt: null,
    ...extra,
  };
}

export function campaignWindow(group: number, extra: Partial<CampaignWindow> = {}): CampaignWindow {
  return {
    group, label: `Group ${group + 1}`, elements: [{ kind: 'site', id: `site-${group}`, name: `Site ${group + 1}` }],
    start: '2030-01-10T01:00:00.000Z', end: '2030-01-10T05:00:00.000Z', night: '2030-01-10', cost: 10 + group, touched: 3, unresolved: 0, criticalTouched: 0,
    explanation: 'Quietest night for these sites.', alternatives: [
      { start: '2030-01-11T01:00:00.000Z', end: '2030-01-11T05:00:00.000Z', night: '2030-01-11', cost: 14 },
      { start: '2030-01-12T01:00:00.000Z', end: '2030-01-12T05:00:00.000Z', night: '2030-01-12', cost: 15 },
    ],
    ...extra,
  };
}

export function campaign(extra: Partial<Campaign> = {}): Campaign {
  return {
    id: 'c-1', title: 'Software upgrade, north', status: 'draft', version: 2, progress: null,
    request: {
      groups: [{ label: 'Group 1', sites: ['site-0'], spans: [] }, { label: 'Group 2', sites: ['site-1'], spans: [] }],
      durationHours: 4, from: '2030-01-08T01:00:00.000Z', to: '2030-01-29T06:00:00.000Z', hours: { start: '00:00', end: '05:00' },
      stepMinutes: 60, maxPerNight: 1, minDaysBetweenTouches: 7,
    },
    windows: [campaignWindow(0), campaignWindow(1, { start: '2030-01-13T01:00:00.000Z', end: '2030-01-13T05:00:00.000Z', night: '2030-01-13' })],
    unscheduled: [], totalCost: 21, startCost: 30, startScheduled: 2, bookedWindowIds: [], error: null,
    createdBy: { id: 'u-pl', name: 'Pat Planner' }, createdAt: '2030-01-01T10:00:00.000Z', updatedAt: '2030-01-01T10:00:00.000Z',
    ...extra,
  };
}
