// The booking form's values, its checks before anything is sent, and the body it sends: pure, so tests need no screen.
import type { Policies } from '@/shared/policies';
import { timeIssues } from '@/shared/window-checks';
import type { WindowElementInput } from '@/shared/windows';
import { instantToWallFields, toIsoWithOffset, zonedWallToInstant } from '@/components/windows/zoned-time';

export const WORK_TYPES = ['software upgrade', 'fibre splice', 'power work', 'hardware swap', 'site access'] as const;
export const OTHER_WORK_TYPE = 'other';

export type ElementKind = 'site' | 'span';
export type ElementEffect = 'down' | 'reduced';

export type PickedElement = {
  kind: ElementKind;
  id: string;
  /** What people read: a site's name, a span's end names. */
  label: string;
  /** What tells it apart from similar ones (kind, compute and place; capacity and length), as the search showed it;
   *  absent for elements loaded with a saved window, which the form then looks up. */
  detail?: string;
  effect: ElementEffect;
  /** The remaining capacity as typed, in percent ("40"); only read when `effect` is reduced. */
  percentText: string;
};

export type WindowFormValues = {
  title: string;
  startDate: string;
  startTime: string;
  endDate: string;
  endTime: string;
  /** One of WORK_TYPES, OTHER_WORK_TYPE, or '' for none chosen. */
  workType: string;
  otherWorkType: string;
  elements: PickedElement[];
  notes: string;
};

export type FieldKey = 'title' | 'start' | 'end' | 'workType' | 'elements' | 'notes' | 'overrideReason';
export type FieldErrors = Partial<Record<FieldKey, string>> & { elementFraction?: Record<string, string> };

export const TITLE_MAX_CHARS = 200;
export const NOTES_MAX_CHARS = 10_000;

export const EMPTY_FORM: WindowFormValues = {
  title: '', startDate: '', startTime: '', endDate: '', endTime: '',
  workType: '', otherWorkType: '', elements: [], notes: '',
};

export type WindowFormOutput = {
  title: string;
  startsAt: string;
  endsAt: string;
  workType: string | null;
  notes: string | null;
  elements: WindowElementInput[];
};

export type ValidateContext = { timeZone: string; now: Date; policy: Pick<Policies, 'maxWindowHours' | 'bookingSkewMinutes'> };

export const elementKey = (e: Pick<PickedElement, 'kind' | 'id'>) => `${e.kind}:${e.id}`;

function readTime(date: string, time: string, timeZone: string, label: string): { ms?: number; error?: string } {
  if (!date.trim() || !time.trim()) return { error: `Enter the ${label} date and time.` };
  const parsed = zonedWallToInstant(date, time, timeZone);
  if (parsed.ok) return { ms: parsed.instantMs };
  if (parsed.reason === 'skipped') return { error: `Clocks skip that time in ${timeZone} (daylight saving). Pick another.` };
  return { error: 'Enter a date such as 2027-01-08 or 8 Jan 2027, and a 24-hour time such as 01:00.' };
}

/** Field a booking rule's issue belongs to, from its JSON path ("$.endsAt" → end). */
export function fieldForIssuePath(path: string): FieldKey | null {
  if (path.startsWith('$.startsAt')) return 'start';
  if (path.startsWith('$.endsAt')) return 'end';
  if (path.startsWith('$.elements')) return 'elements';
  if (path.startsWith('$.title')) return 'title';
  if (path.startsWith('$.workType')) return 'workType';
  if (path.startsWith('$.notes')) return 'notes';
  if (path.startsWith('$.freezeOverrideReason')) return 'overrideReason';
  return null;
}

function checkTimes(values: WindowFormValues, ctx: ValidateContext, errors: FieldErrors) {
  const start = readTime(values.startDate, values.startTime, ctx.timeZone, 'start');
  const end = readTime(values.endDate, values.endTime, ctx.timeZone, 'end');
  if (start.error) errors.start = start.error;
  if (end.error) errors.end = end.error;
  if (start.ms === undefined || end.ms === undefined) return { startMs: start.ms, endMs: end.ms };
  // The same rules the server applies (shared/window-checks), so both speak of the same problems.
  const times = { startsAt: new Date(start.ms).toISOString(), endsAt: new Date(end.ms).toISOString() };
  for (const issue of timeIssues(times, ctx.policy, ctx.now)) {
    const field = fieldForIssuePath(issue.path);
    if (field && !errors[field]) errors[field] = issue.message;
  }
  return { startMs: start.ms, endMs: end.ms };
}

/** Parses "40" or "40 %" into 0.4; null when not a share strictly between 0 and 100 %. */
export function parsePercent(text: string): number | null {
  const match = /^\s*(\d+(?:[.,]\d+)?)\s*%?\s*$/.exec(text);
  if (!match) return null;
  const percent = Number(match[1].replace(',', '.'));
  return percent > 0 && percent < 100 ? percent / 100 : null;
}

function checkElements(values: WindowFormValues, errors: FieldErrors): WindowElementInput[] {
  if (values.elements.length === 0) errors.elements = 'Pick at least one site or span the work takes out.';
  const fractionErrors: Record<string, string> = {};
  const elements = values.elements.map((e): WindowElementInput => {
    if (e.effect === 'down') return { kind: e.kind, id: e.id, effect: 'down' };
    const fraction = parsePercent(e.percentText);
    if (fraction === null) fractionErrors[elementKey(e)] = 'Enter the capacity left, between 1 and 99 %.';
    return { kind: e.kind, id: e.id, effect: 'reduced', fraction };
  });
  if (Object.keys(fractionErrors).length > 0) errors.elementFraction = fractionErrors;
  return elements;
}

function chosenWorkType(values: WindowFormValues): string | null {
  if (values.workType === OTHER_WORK_TYPE) return values.otherWorkType.trim() || null;
  return values.workType || null;
}

/** Checks everything the form can check by itself; `output` is set only when there are no errors. */
export function validateWindowForm(values: WindowFormValues, ctx: ValidateContext): { errors: FieldErrors; output: WindowFormOutput | null } {
  const errors: FieldErrors = {};
  const title = values.title.trim();
  if (!title) errors.title = 'Give the window a title.';
  else if (title.length > TITLE_MAX_CHARS) errors.title = `Keep the title under ${TITLE_MAX_CHARS} characters.`;
  const { startMs, endMs } = checkTimes(values, ctx, errors);
  if (values.workType === OTHER_WORK_TYPE && !values.otherWorkType.trim()) errors.workType = 'Say what kind of work it is.';
  if (values.notes.length > NOTES_MAX_CHARS) errors.notes = `Keep the notes under ${NOTES_MAX_CHARS} characters.`;
  const elements = checkElements(values, errors);
  if (Object.keys(errors).length > 0 || startMs === undefined || endMs === undefined) return { errors, output: null };
  return {
    errors,
    output: {
      title,
      startsAt: toIsoWithOffset(startMs, ctx.timeZone),
      endsAt: toIsoWithOffset(endMs, ctx.timeZone),
      workType: chosenWorkType(values),
      notes: values.notes.trim() || null,
      elements,
    },
  };
}

export type ExistingWindow = {
  title: string;
  startsAt: string;
  endsAt: string;
  workType: string | null;
  notes: string | null;
  elements: { kind: ElementKind; id: string; name?: string | null; effect: ElementEffect; fraction: number | null }[];
};

/** Form values for editing an existing window, its times shown in `timeZone`. */
export function formValuesFromWindow(w: ExistingWindow, timeZone: string): WindowFormValues {
  const start = instantToWallFields(w.startsAt, timeZone);
  const end = instantToWallFields(w.endsAt, timeZone);
  const known = (WORK_TYPES as readonly string[]).includes(w.workType ?? '');
  return {
    title: w.title,
    startDate: start.date, startTime: start.time, endDate: end.date, endTime: end.time,
    workType: w.workType ? (known ? w.workType : OTHER_WORK_TYPE) : '',
    otherWorkType: w.workType && !known ? w.workType : '',
    notes: w.notes ?? '',
    elements: w.elements.map((e) => ({
      kind: e.kind, id: e.id, label: e.name ?? e.id, effect: e.effect,
      percentText: e.fraction === null ? '' : String(Math.round(e.fraction * 100)),
    })),
  };
}
