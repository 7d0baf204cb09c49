// The audit trail's filters as a person sets them (a window, a person, an action, a range of days in their own
// zone) and as the API takes them (ids, a code and instants).
import type { AuditParams } from '@/hooks/queries/audit';
import { endOfDayMs, startOfDayMs } from '@/components/time';

export type AuditFilters = {
  window: string | null;
  person: string | null;
  action: string | null;
  /** calendar days 'YYYY-MM-DD' in the viewer's zone, both ends included */
  fromDay: string | null;
  toDay: string | null;
};

export const NO_FILTERS: AuditFilters = { window: null, person: null, action: null, fromDay: null, toDay: null };

export const hasFilters = (f: AuditFilters) => Object.values(f).some((v) => v !== null);

/** The range's days become the instants they start and end in the viewer's zone; unset filters are left out. */
export function auditParams(f: AuditFilters, timeZone: string): AuditParams {
  const params: AuditParams = {};
  if (f.window) params.window = f.window;
  if (f.person) params.person = f.person;
  if (f.action) params.action = f.action;
  if (f.fromDay) params.from = new Date(startOfDayMs(f.fromDay, timeZone)).toISOString();
  if (f.toDay) params.to = new Date(endOfDayMs(f.toDay, timeZone)).toISOString();
  return params;
}

/** A range that ends before it starts is refused here, in words, before the API is asked. */
export function rangeProblem(f: AuditFilters): string | null {
  return f.fromDay && f.toDay && f.toDay < f.fromDay ? 'The last day comes before the first day; pick them the other way round.' : null;
}
