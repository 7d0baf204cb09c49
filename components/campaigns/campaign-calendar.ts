// Draft campaigns on the calendar: each scheduled window becomes an outlined "Draft" bar that opens its campaign.
// They are not windows yet (nothing is booked), so they carry the campaign and never a window's page.
import type { z } from 'zod';
import type { campaignListSchema } from '@/shared/slots';
import type { CalendarWindow } from '@/components/calendar/calendar-types';

type ListedCampaign = z.infer<typeof campaignListSchema>['campaigns'][number];

const DRAFT_ID_PREFIX = 'campaign-draft:';

/** The calendar entries of the draft campaigns among `campaigns` (others are skipped). */
export function draftCalendarWindows(campaigns: readonly ListedCampaign[]): CalendarWindow[] {
  return campaigns.filter((c) => c.status === 'draft').flatMap((c) => c.windows.map((w): CalendarWindow => ({
    id: `${DRAFT_ID_PREFIX}${c.id}:${w.group}`,
    title: w.label,
    startsAt: w.start,
    endsAt: w.end,
    status: 'draft',
    statusLabel: 'Draft campaign, not booked',
    detail: `Campaign “${c.title}”: ${w.elements.map((e) => e.name).join(', ')}`,
    conflictCount: 0,
    touchesCritical: false,
    elements: w.elements.map((e) => ({ kind: e.kind, id: e.id, effect: 'down' as const, fraction: null })),
    workType: null,
    campaign: { id: c.id, title: c.title },
  })));
}

/** The campaign a calendar entry belongs to, or null for a real window. */
export function campaignIdOf(calendarWindowId: string): string | null {
  if (!calendarWindowId.startsWith(DRAFT_ID_PREFIX)) return null;
  const rest = calendarWindowId.slice(DRAFT_ID_PREFIX.length);
  return rest.slice(0, rest.lastIndexOf(':'));
}
