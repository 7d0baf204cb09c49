// The campaign form: a title, element groups (one window each), the timing, and the two rules; its checks and the
// request it sends. Pure, so tests need no screen.
import type { CampaignCreate } from '@/shared/slots';
import type { SlotElement } from '@/components/slots/slot-form-state';
import { validateTiming, type TimingErrors, type TimingValues } from '@/components/slots/timing-form-state';

export type CampaignGroupValues = { key: string; label: string; elements: SlotElement[] };

export type CampaignFormValues = TimingValues & {
  title: string;
  groups: CampaignGroupValues[];
  /** "at most N windows a night", as typed */
  maxPerNightText: string;
  /** "a slice touched at most once in D days", as typed; 0 for no limit */
  minDaysText: string;
};

export type CampaignFormErrors = TimingErrors & {
  title?: string; groups?: string; maxPerNight?: string; minDays?: string;
  /** per group key: what is wrong with that group */
  group?: Record<string, string>;
};

export const MAX_PER_NIGHT_LIMIT = 50;
export const MIN_DAYS_LIMIT = 60;

let nextKey = 0;
/** A new empty group row; keys only tell rows apart on screen. */
export function newGroup(label = ''): CampaignGroupValues {
  nextKey += 1;
  return { key: `g${nextKey}`, label, elements: [] };
}

function wholeNumber(text: string, min: number, max: number): number | null {
  if (!/^\s*\d+\s*$/.test(text)) return null;
  const n = Number(text);
  return n >= min && n <= max ? n : null;
}

function checkGroups(groups: readonly CampaignGroupValues[], errors: CampaignFormErrors) {
  if (groups.length === 0) errors.groups = 'Add at least one group of sites or spans.';
  const perGroup: Record<string, string> = {};
  groups.forEach((g, i) => {
    const name = g.label.trim() || `Group ${i + 1}`;
    if (!g.label.trim()) perGroup[g.key] = `Give group ${i + 1} a name.`;
    else if (g.elements.length === 0) perGroup[g.key] = `Pick at least one site or span for “${name}”.`;
  });
  if (Object.keys(perGroup).length > 0) {
    errors.group = perGroup;
    errors.groups ??= Object.keys(perGroup).length === 1 ? Object.values(perGroup)[0] : `${Object.keys(perGroup).length} groups need a name or an element.`;
  }
}

export function validateCampaignForm(values: CampaignFormValues): { errors: CampaignFormErrors; output: CampaignCreate | null } {
  const timing = validateTiming(values);
  const errors: CampaignFormErrors = { ...timing.errors };
  const title = values.title.trim();
  if (!title) errors.title = 'Give the campaign a title.';
  else if (title.length > 200) errors.title = 'Keep the title under 200 characters.';
  checkGroups(values.groups, errors);
  const maxPerNight = wholeNumber(values.maxPerNightText, 1, MAX_PER_NIGHT_LIMIT);
  if (maxPerNight === null) errors.maxPerNight = `Enter a whole number of windows from 1 to ${MAX_PER_NIGHT_LIMIT}.`;
  const minDays = wholeNumber(values.minDaysText, 0, MIN_DAYS_LIMIT);
  if (minDays === null) errors.minDays = `Enter a whole number of days from 0 (no limit) to ${MIN_DAYS_LIMIT}.`;
  if (Object.keys(errors).length > 0 || !timing.output || maxPerNight === null || minDays === null) return { errors, output: null };
  return {
    errors,
    output: {
      title,
      groups: values.groups.map((g) => ({
        label: g.label.trim(),
        sites: g.elements.filter((e) => e.kind === 'site').map((e) => e.id),
        spans: g.elements.filter((e) => e.kind === 'span').map((e) => e.id),
      })),
      ...timing.output,
      maxPerNight,
      minDaysBetweenTouches: minDays,
    },
  };
}
