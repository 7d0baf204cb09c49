// Turns a failed sign-in into words for the person at the keyboard.
import { CLIENT_ERROR_CODES, isApiError } from '@/hooks/api-fetch';

export const SIGN_IN_MESSAGES = {
  badCredentials: 'E-mail or password is wrong.',
  rateLimited: 'Too many sign-in attempts. Wait a minute, then try again.',
  network: 'Could not reach the Slackwater server. Check your connection and try again.',
  unknown: 'Signing in failed. Try again in a moment.',
} as const;

export function signInErrorMessage(error: unknown): string {
  if (!isApiError(error)) return SIGN_IN_MESSAGES.unknown;
  if (error.code === 'BAD_CREDENTIALS') return SIGN_IN_MESSAGES.badCredentials;
  if (error.status === 429) return SIGN_IN_MESSAGES.rateLimited;
  if (error.code === CLIENT_ERROR_CODES.network) return SIGN_IN_MESSAGES.network;
  // Validation and other 4xx messages from the server are written for people; 5xx ones may not be.
  if (error.status >= 400 && error.status < 500 && error.message) return error.message;
  return SIGN_IN_MESSAGES.unknown;
}
