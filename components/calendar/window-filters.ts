// The calendar's filters: which go to the API (mine, status, tenant) and the text search done on the screen.
import type { WindowStatus } from '@/shared/windows';
import type { WindowListParams } from '@/hooks/queries/windows-list';
import type { CalendarWindow } from './calendar-types';

export type WindowFilters = {
  mine: boolean;
  statuses: WindowStatus[];
  /** matches a site or span id, or the window's title, case-insensitive */
  elementText: string;
  tenantId: string | null;
};

export const NO_FILTERS: WindowFilters = { mine: false, statuses: [], elementText: '', tenantId: null };

export function countActiveFilters(filters: WindowFilters): number {
  return (
    (filters.mine ? 1 : 0) + (filters.statuses.length > 0 ? 1 : 0) + (filters.elementText.trim() ? 1 : 0) + (filters.tenantId ? 1 : 0)
  );
}

/** The list request for a range with the filters the API applies itself. */
export function listParams(range: { from: string; to: string }, filters: WindowFilters): WindowListParams {
  return {
    ...range,
    mine: filters.mine || undefined,
    statuses: filters.statuses.length > 0 ? [...filters.statuses].sort() : undefined,
    tenant: filters.tenantId ?? undefined,
  };
}

/** Free-text search: every word must appear in the title, the work type or one of the element ids. */
export function matchesText(window: CalendarWindow, text: string): boolean {
  const words = text.toLowerCase().split(/\s+/).filter(Boolean);
  if (words.length === 0) return true;
  const haystack = [window.title, window.workType ?? '', ...window.elements.map((e) => e.id)].join(' ').toLowerCase();
  return words.every((word) => haystack.includes(word));
}

export function toggleStatus(filters: WindowFilters, status: WindowStatus): WindowFilters {
  const has = filters.statuses.includes(status);
  return { ...filters, statuses: has ? filters.statuses.filter((s) => s !== status) : [...filters.statuses, status] };
}
