// Why single sign-on sent someone back to the sign-in screen, in words for them.
import { ssoErrorCodeSchema, type SsoErrorCode } from '@/shared/sso';

export const SSO_ERROR_MESSAGES: Record<SsoErrorCode, string> = {
  off: 'Single sign-on is not set up here. Sign in with your e-mail and password.',
  issuer: 'Could not reach your company sign-in service. Try again in a moment; if it keeps happening, tell your administrator.',
  denied: 'Sign-in was cancelled at your company sign-in service.',
  state: 'That sign-in started in another tab or took too long. Start again.',
  nonce: 'That sign-in could not be checked. Start again.',
  token: 'Your company sign-in service sent an answer Slackwater cannot trust, or it came too late. Start again.',
  'no-access': 'You signed in, but none of your groups gives access to Slackwater. Ask your administrator to add you to a group that does.',
  tenant: 'This e-mail belongs to a tenant account. Tenant accounts sign in with their e-mail and password.',
  deactivated: 'This account is deactivated. Ask your administrator if you need access again.',
  email: 'Your company sign-in service did not confirm an e-mail address for you, so Slackwater cannot tell which account is yours.',
};

/** The message for a `sso_error` value in the address, or null when there is none or it is unknown. */
export function ssoErrorMessage(code: string | string[] | undefined): string | null {
  const parsed = ssoErrorCodeSchema.safeParse(Array.isArray(code) ? code[0] : code);
  return parsed.success ? SSO_ERROR_MESSAGES[parsed.data] : null;
}
