// The admin's single sign-on settings: read without the secret, save with the checks that keep someone able to
// sign in, and the rule that turns password sign-in off for staff.
import type { Db } from '../../../db/client';
import type { Me } from '../../../shared/api';
import { isOperator } from '../../../shared/permissions';
import type { SsoSettings, SsoSettingsUpdate } from '../../../shared/sso';
import { insertAuditEntry } from '../../queries/audit/audit-log';
import { countActiveAdmins } from '../../queries/auth/users-people';
import { countAdminsWithSso } from '../../queries/sso/identities';
import { getSsoSettings, getSsoSettingsForUpdate, upsertSsoSettings, type SsoSettingsRow } from '../../queries/sso/settings';
import { PasswordSignInOffError, SsoLastAdminError, SsoSecretRequiredError } from './errors';

export const SSO_CALLBACK_PATH = '/api/auth/sso/callback';
export const ssoRedirectUri = (publicUrl: string) => `${publicUrl}${SSO_CALLBACK_PATH}`;

/** What the settings screen reads: everything but the secret, which it only learns is set. */
export function toPublicSettings(row: SsoSettingsRow | null, redirectUri: string): SsoSettings {
  return {
    configured: row !== null,
    enabled: row?.enabled ?? false,
    issuerUrl: row?.issuerUrl ?? '',
    clientId: row?.clientId ?? '',
    clientSecretSet: (row?.clientSecret ?? '') !== '',
    displayName: row?.displayName ?? '',
    groupsClaim: row?.groupsClaim ?? 'groups',
    groupRoles: row?.groupRoles ?? [],
    passwordSignInForStaff: row?.passwordSignInForStaff ?? true,
    redirectUri,
  };
}

/** Audit shape of the settings: never the secret, only whether it changed. */
function auditView(row: Omit<SsoSettingsRow, 'id' | 'updatedAt'> | null) {
  if (!row) return null;
  const { clientSecret: _secret, ...rest } = row;
  return rest;
}

export async function saveSsoSettings(
  db: Db, { input, actorId, now, redirectUri }: { input: SsoSettingsUpdate; actorId: string; now: Date; redirectUri: string },
): Promise<SsoSettings> {
  return db.transaction(async (tx) => {
    const current = await getSsoSettingsForUpdate(tx);
    const newSecret = input.clientSecret !== undefined && input.clientSecret !== '';
    const clientSecret = newSecret ? input.clientSecret! : current?.clientSecret ?? '';
    if (clientSecret === '') throw new SsoSecretRequiredError();
    // WARNING: with staff passwords off, only admins who can get in through this issuer can manage Slackwater.
    if (!input.passwordSignInForStaff && (!input.enabled || (await countAdminsWithSso(tx, input.issuerUrl)) === 0)) {
      throw new SsoLastAdminError();
    }
    const values = {
      enabled: input.enabled, issuerUrl: input.issuerUrl, clientId: input.clientId, clientSecret, displayName: input.displayName,
      groupsClaim: input.groupsClaim, groupRoles: input.groupRoles, passwordSignInForStaff: input.passwordSignInForStaff,
    };
    await upsertSsoSettings(tx, { ...values, updatedAt: now });
    await insertAuditEntry(tx, {
      actorId, action: 'sso-settings-changed', entity: 'sso-settings', entityId: 'default',
      before: auditView(current), after: { ...auditView(values), clientSecretChanged: newSecret }, at: now,
    });
    return toPublicSettings({ id: 'default', ...values, updatedAt: now }, redirectUri);
  });
}

/**
 * Refuses password sign-in to staff when an admin turned it off. Tenant accounts always keep it, and so does the
 * last active admin: if the issuer fails or is misconfigured, someone must still be able to sign in and fix it.
 */
export async function assertPasswordSignInAllowed(db: Db, user: Me, now: Date): Promise<void> {
  const settings = await getSsoSettings(db);
  if (!settings || !settings.enabled || settings.passwordSignInForStaff || !isOperator(user.roles)) return;
  if (user.roles.includes('admin') && (await countActiveAdmins(db, { exceptId: user.id })) === 0) return;
  await insertAuditEntry(db, { actorId: user.id, action: 'sign-in-refused', entity: 'user', entityId: user.id,
    after: { reason: 'password sign-in is off for staff' }, at: now });
  throw new PasswordSignInOffError(settings.displayName);
}

export { getSsoSettings };
