// The freeze form's fields (local date and time in the viewer's zone) ↔ the API's request, with validation:
// a title, real dates and times, and an end after the start.
import { freezeCreateSchema, type Freeze, type FreezeCreate } from '@/shared/freezes';
import { instantToWallFields, toIsoWithOffset, zonedWallToInstant } from '@/components/windows/zoned-time';

export type FreezeDraft = {
  title: string;
  startDate: string;
  startTime: string;
  endDate: string;
  endTime: string;
  reason: string;
};

export type FreezeDraftErrors = Partial<Record<'title' | 'start' | 'end', string>>;

export type FreezeDraftResult = { ok: true; value: FreezeCreate } | { ok: false; errors: FreezeDraftErrors };

export const EMPTY_FREEZE_DRAFT: FreezeDraft = { title: '', startDate: '', startTime: '00:00', endDate: '', endTime: '00:00', reason: '' };

export function draftFromFreeze(freeze: Freeze, timeZone: string): FreezeDraft {
  const start = instantToWallFields(freeze.startsAt, timeZone);
  const end = instantToWallFields(freeze.endsAt, timeZone);
  return { title: freeze.title, startDate: start.date, startTime: start.time, endDate: end.date, endTime: end.time, reason: freeze.reason ?? '' };
}

function instantError(reason: 'format' | 'skipped'): string {
  return reason === 'skipped'
    ? 'That time does not exist here (clocks jump forward then). Pick another.'
    : 'Enter a date such as 2027-01-08 or 8 Jan 2027, and a time such as 01:00.';
}

/** Checks the draft and builds the request; messages say what to fix. */
export function validateFreezeDraft(draft: FreezeDraft, timeZone: string): FreezeDraftResult {
  const errors: FreezeDraftErrors = {};
  if (!draft.title.trim()) errors.title = 'Give the freeze a title.';
  const start = zonedWallToInstant(draft.startDate, draft.startTime, timeZone);
  const end = zonedWallToInstant(draft.endDate, draft.endTime, timeZone);
  if (!start.ok) errors.start = instantError(start.reason);
  if (!end.ok) errors.end = instantError(end.reason);
  if (start.ok && end.ok && end.instantMs <= start.instantMs) errors.end = 'The freeze must end after it starts.';
  if (Object.keys(errors).length > 0 || !start.ok || !end.ok) return { ok: false, errors };
  const value = {
    title: draft.title.trim(),
    startsAt: toIsoWithOffset(start.instantMs, timeZone),
    endsAt: toIsoWithOffset(end.instantMs, timeZone),
    reason: draft.reason.trim() || null,
  };
  // The shared schema is what the server applies; agreeing with it here means no surprise 400s.
  const parsed = freezeCreateSchema.safeParse(value);
  if (!parsed.success) return { ok: false, errors: { title: parsed.error.issues[0]?.message ?? 'Check the fields.' } };
  return { ok: true, value: parsed.data };
}
