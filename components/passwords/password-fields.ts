// Checks a new password typed twice before it is sent: length and sameness here; strength is the server's call.
import { PASSWORD_MAX_CHARS, PASSWORD_MIN_CHARS } from '@/shared/passwords';
import { CLIENT_ERROR_CODES, isApiError } from '@/hooks/api-fetch';

export const PASSWORDS_DIFFER = 'The two passwords are not the same';

export type NewPasswordErrors = { password?: string; again?: string };

export function checkNewPassword(password: string, again: string): NewPasswordErrors {
  const errors: NewPasswordErrors = {};
  if (password.length < PASSWORD_MIN_CHARS) errors.password = `Use at least ${PASSWORD_MIN_CHARS} characters`;
  else if (password.length > PASSWORD_MAX_CHARS) errors.password = `Use at most ${PASSWORD_MAX_CHARS} characters`;
  if (again !== password) errors.again = PASSWORDS_DIFFER;
  return errors;
}

/** The server's answer in words a person can act on; its own message for refusals (feedback included). */
export function passwordErrorMessage(error: unknown, fallback: string): string {
  if (!isApiError(error)) return fallback;
  if (error.code === CLIENT_ERROR_CODES.network) return error.message;
  return error.status >= 400 && error.status < 500 ? error.message : fallback;
}
