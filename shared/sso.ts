// Single sign-on through OpenID Connect: the admin's issuer settings, the sign-in button, and the reasons a
// single sign-on attempt comes back to the sign-in screen.
import { z } from 'zod';

/** Roles single sign-on may grant: staff only. Tenant accounts never come through the company's issuer. */
export const SSO_ROLE_NAMES = ['admin', 'engineer', 'planner', 'approver'] as const;
export const ssoRoleSchema = z.enum(SSO_ROLE_NAMES);
export type SsoRoleName = z.infer<typeof ssoRoleSchema>;

export const ssoGroupRolesSchema = z.object({
  group: z.string().trim().min(1, 'Enter the group name as the issuer sends it').max(200, 'Use at most 200 characters'),
  roles: z.array(ssoRoleSchema).min(1, 'Choose at least one role for this group')
    .refine((roles) => new Set(roles).size === roles.length, 'Each role once'),
});
export type SsoGroupRoles = z.infer<typeof ssoGroupRolesSchema>;

/** GET /api/sso (admin): the settings as saved. The client secret itself never leaves the server. */
export const ssoSettingsSchema = z.object({
  configured: z.boolean(),
  enabled: z.boolean(),
  issuerUrl: z.string(),
  clientId: z.string(),
  clientSecretSet: z.boolean(),
  displayName: z.string(),
  groupsClaim: z.string(),
  groupRoles: z.array(ssoGroupRolesSchema),
  passwordSignInForStaff: z.boolean(),
  /** the address to register at the issuer as this application's redirect URI */
  redirectUri: z.string(),
});
export type SsoSettings = z.infer<typeof ssoSettingsSchema>;

/** PUT /api/sso (admin). An omitted or empty clientSecret keeps the one already stored. */
export const ssoSettingsUpdateSchema = z.object({
  enabled: z.boolean(),
  issuerUrl: z.url({ protocol: /^https?$/, error: 'Enter the issuer address, starting with https://' }).max(500)
    .transform((url) => url.replace(/\/+$/, '')),
  clientId: z.string().trim().min(1, 'Enter the client ID the issuer gave you').max(500),
  clientSecret: z.string().max(1000).optional(),
  displayName: z.string().trim().min(1, 'Enter the name on the sign-in button').max(60, 'Use at most 60 characters'),
  groupsClaim: z.string().trim().min(1, 'Enter the claim that lists groups').max(100)
    .regex(/^[A-Za-z0-9_:.\-/]+$/, 'Letters, digits and _ : . - / only'),
  groupRoles: z.array(ssoGroupRolesSchema).max(100)
    .refine((rows) => new Set(rows.map((r) => r.group)).size === rows.length, 'Each group once'),
  passwordSignInForStaff: z.boolean(),
});
export type SsoSettingsUpdate = z.infer<typeof ssoSettingsUpdateSchema>;

/** GET /api/auth/sso/button (no session): whether the sign-in screen offers single sign-on, and its words. */
export const ssoButtonSchema = z.object({ enabled: z.boolean(), displayName: z.string().nullable() });
export type SsoButton = z.infer<typeof ssoButtonSchema>;

/** Why a single sign-on attempt came back to the sign-in screen (`/sign-in?sso_error=<code>`). */
export const SSO_ERROR_CODES = [
  'off', 'issuer', 'denied', 'state', 'nonce', 'token', 'no-access', 'tenant', 'deactivated', 'email',
] as const;
export type SsoErrorCode = (typeof SSO_ERROR_CODES)[number];
export const ssoErrorCodeSchema = z.enum(SSO_ERROR_CODES);
