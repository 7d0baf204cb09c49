// Turns a refused booking or edit into what the form shows: field errors, a freeze refusal, a stale-version notice.
import { CLIENT_ERROR_CODES, isApiError } from '@/hooks/api-fetch';
import { fieldForIssuePath, type FieldErrors, type FieldKey } from '@/components/windows/window-form-state';

export const SAVE_MESSAGES = {
  stale: 'Someone else changed this window — reload to see their changes.',
  network: 'Could not reach the Slackwater server. Your input is kept; try again.',
  unknown: 'Saving failed. Your input is kept; try again in a moment.',
} as const;

/** Booking-rule codes the server may answer with, and the field each belongs to. */
const CODE_FIELDS: Record<string, FieldKey> = {
  WINDOW_ENDS_BEFORE_START: 'end',
  WINDOW_TOO_LONG: 'end',
  WINDOW_IN_PAST: 'start',
  WINDOW_NO_ELEMENTS: 'elements',
  WINDOW_BAD_FRACTION: 'elements',
  WINDOW_DUPLICATE_ELEMENTS: 'elements',
  UNKNOWN_ELEMENTS: 'elements',
};

export type SaveErrorView = {
  fieldErrors: FieldErrors;
  /** A message for the top of the form when no field can carry it. */
  banner: string | null;
  /** The server's words on which freeze the times fall into. */
  freeze: string | null;
  stale: boolean;
};

function fieldErrorsFrom(details: readonly { path: string; message: string }[]): FieldErrors {
  const errors: FieldErrors = {};
  for (const detail of details) {
    const field = fieldForIssuePath(detail.path);
    if (field && !errors[field]) errors[field] = detail.message;
  }
  return errors;
}

export function saveErrorView(error: unknown): SaveErrorView {
  const none: SaveErrorView = { fieldErrors: {}, banner: null, freeze: null, stale: false };
  if (!error) return none;
  if (!isApiError(error)) return { ...none, banner: SAVE_MESSAGES.unknown };
  if (error.code === 'STALE_VERSION') return { ...none, stale: true };
  if (error.code === 'FREEZE_CONFLICT') return { ...none, freeze: error.message };
  if (error.code === CLIENT_ERROR_CODES.network) return { ...none, banner: SAVE_MESSAGES.network };
  const fieldErrors = fieldErrorsFrom(error.details);
  const codeField = CODE_FIELDS[error.code];
  if (codeField && !fieldErrors[codeField]) fieldErrors[codeField] = error.message;
  if (Object.keys(fieldErrors).length > 0) return { ...none, fieldErrors };
  // 4xx messages are written for people; a 5xx's may not be.
  const readable = error.status >= 400 && error.status < 500 && error.message;
  return { ...none, banner: readable ? error.message : SAVE_MESSAGES.unknown };
}
