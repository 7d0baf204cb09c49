// The "new run" form: text fields as typed, turned into settings for the API, and the API's complaints placed by field.
import { planSettingsSchema, type PlanSettings } from '@/shared/plans';
import { isApiError } from '@/hooks/api-fetch';

export type PlanFormState = {
  mode: PlanSettings['mode'];
  seed: string;
  population: string;
  timeLimitSeconds: string;
  afterWindow: PlanSettings['afterWindow'];
  pinned: string[];
  excludedSites: string[];
  /** may the search move or reroute slices the window does not touch (knock-on moves) */
  knockOn: boolean;
  maxKnockOnMoves: string;
};

export type PlanFormField = keyof PlanFormState;
export type PlanFormErrors = Partial<Record<PlanFormField | 'form', string>>;

/** The contract's defaults, so the form and the server start from the same run. */
export const DEFAULT_PLAN_SETTINGS: PlanSettings = planSettingsSchema.parse({});

export function formFromSettings(settings: PlanSettings = DEFAULT_PLAN_SETTINGS): PlanFormState {
  return {
    mode: settings.mode,
    seed: String(settings.seed),
    population: String(settings.population),
    timeLimitSeconds: String(settings.timeLimitSeconds),
    afterWindow: settings.afterWindow,
    pinned: [...settings.pinned],
    excludedSites: [...settings.excludedSites],
    knockOn: settings.knockOn,
    maxKnockOnMoves: String(settings.maxKnockOnMoves),
  };
}

const FIELDS: readonly PlanFormField[] = [
  'mode', 'seed', 'population', 'timeLimitSeconds', 'afterWindow', 'pinned', 'excludedSites', 'knockOn', 'maxKnockOnMoves',
];

function asNumber(text: string): number {
  // Empty stays NaN so the schema names the field rather than silently sending 0.
  return text.trim() === '' ? Number.NaN : Number(text.trim());
}

/** Settings ready to send, or messages by field (checked here with the same schema the server uses). */
export function settingsFromForm(state: PlanFormState): { settings: PlanSettings } | { errors: PlanFormErrors } {
  const parsed = planSettingsSchema.safeParse({
    ...state,
    seed: asNumber(state.seed),
    population: asNumber(state.population),
    timeLimitSeconds: asNumber(state.timeLimitSeconds),
    maxKnockOnMoves: asNumber(state.maxKnockOnMoves),
  });
  if (parsed.success) return { settings: parsed.data };
  const errors: PlanFormErrors = {};
  for (const issue of parsed.error.issues) {
    const field = FIELDS.find((f) => f === issue.path[0]) ?? 'form';
    errors[field] ??= fieldMessage(field, issue.message);
  }
  return { errors };
}

const FIELD_HINTS: Partial<Record<PlanFormField, string>> = {
  seed: 'A whole number from 0 to 2147483647.',
  population: 'A whole number from 8 to 400.',
  timeLimitSeconds: 'Seconds, from 1 to 600.',
  maxKnockOnMoves: 'A whole number from 0 to 50.',
};

function fieldMessage(field: PlanFormField | 'form', fallback: string): string {
  return (field !== 'form' && FIELD_HINTS[field]) || fallback;
}

/** "$.timeLimitSeconds" or "$.pinned[3]" → the form field; anything else goes to the form as a whole. */
export function errorsFromApi(error: Error | null): PlanFormErrors {
  if (!error) return {};
  const errors: PlanFormErrors = {};
  for (const detail of isApiError(error) ? error.details : []) {
    const name = /^\$?\.?([A-Za-z]+)/.exec(detail.path)?.[1];
    const field = FIELDS.find((f) => f === name) ?? 'form';
    errors[field] ??= detail.message;
  }
  if (Object.keys(errors).length === 0) errors.form = error.message;
  return errors;
}
