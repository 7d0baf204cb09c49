// Booking from a slot: the booking form's address carries the slot's times and elements as search parameters
// (start, end as UTC instants; sites, spans as comma-separated ids), and the form reads them back as its values.
import { EMPTY_FORM, type WindowFormValues } from '@/components/windows/window-form-state';
import { instantToWallFields } from '@/components/windows/zoned-time';

export type SlotPrefill = { start: string; end: string; sites: readonly string[]; spans: readonly string[] };

/** `/windows/new?start=…&end=…&sites=…&spans=…`: the booking form filled with this slot. */
export function bookingHref(p: SlotPrefill): string {
  const query = new URLSearchParams({ start: p.start, end: p.end });
  if (p.sites.length > 0) query.set('sites', p.sites.join(','));
  if (p.spans.length > 0) query.set('spans', p.spans.join(','));
  return `/windows/new?${query.toString()}`;
}

type Params = Record<string, string | string[] | undefined>;

const one = (value: string | string[] | undefined) => (Array.isArray(value) ? value[0] : value);
const ids = (value: string | string[] | undefined) => (one(value) ?? '').split(',').map((id) => id.trim()).filter(Boolean);
const isInstant = (text: string | undefined): text is string => text !== undefined && /^\d{4}-\d{2}-\d{2}T/.test(text) && !Number.isNaN(Date.parse(text));

/**
 * The form's values for a slot in the address, times shown in `timeZone`; null when the address carries no
 * usable slot (no parameters, or times that do not read as instants with the end after the start).
 */
export function prefillFromParams(params: Params, timeZone: string): WindowFormValues | null {
  const start = one(params.start);
  const end = one(params.end);
  if (!isInstant(start) || !isInstant(end) || Date.parse(end) <= Date.parse(start)) return null;
  const from = instantToWallFields(start, timeZone);
  const to = instantToWallFields(end, timeZone);
  // Labels are the ids until the picked list looks their names up (it does so for any label equal to the id).
  const elements = [
    ...ids(params.sites).map((id) => ({ kind: 'site' as const, id })),
    ...ids(params.spans).map((id) => ({ kind: 'span' as const, id })),
  ].map((e) => ({ ...e, label: e.id, effect: 'down' as const, percentText: '' }));
  return { ...EMPTY_FORM, startDate: from.date, startTime: from.time, endDate: to.date, endTime: to.time, elements };
}
