// The callback's work: check state, trade the code, verify the ID token, find or create the user, open a session
// exactly as password sign-in does. Every refusal is written to the audit log with its reason (never a token).
import type { Db } from '../../../db/client';
import { insertAuditEntry } from '../../queries/audit/audit-log';
import type { SsoSettingsRow } from '../../queries/sso/settings';
import { createSession } from '../sessions';
import { discoverIssuer } from './discovery';
import { SsoSignInError } from './errors';
import { exchangeCode, type PendingSignIn } from './flow';
import { verifyIdToken } from './id-token';
import { groupsFromClaim, provisionSsoUser } from './provision';
import { timingSafeEqual } from 'node:crypto';

export type CallbackQuery = { code?: string; state?: string; error?: string };

function sameString(a: string, b: string): boolean {
  const x = Buffer.from(a);
  const y = Buffer.from(b);
  return x.length === y.length && timingSafeEqual(x, y);
}

async function userIdFromCallback(
  db: Db, settings: SsoSettingsRow, pending: PendingSignIn | null, query: CallbackQuery, redirectUri: string, now: Date,
): Promise<string> {
  if (query.error) throw new SsoSignInError('denied', query.error);
  // The state binds this callback to the browser that started the sign-in (CSRF on the redirect, RFC 6749 §10.12).
  if (!pending || pending.issuer !== settings.issuerUrl || !query.state || !sameString(query.state, pending.state)) {
    throw new SsoSignInError('state');
  }
  if (!query.code) throw new SsoSignInError('token', 'no code');
  const metadata = await discoverIssuer(settings.issuerUrl);
  const idToken = await exchangeCode(settings, metadata, redirectUri, { code: query.code, verifier: pending.verifier });
  const claims = await verifyIdToken(idToken, { issuer: metadata.issuer, clientId: settings.clientId, nonce: pending.nonce, jwksUri: metadata.jwksUri, now });
  return provisionSsoUser(db, {
    issuer: settings.issuerUrl,
    subject: claims.sub,
    email: typeof claims.email === 'string' ? claims.email : null,
    emailVerified: claims.email_verified === true,
    name: typeof claims.name === 'string' && claims.name.trim() !== '' ? claims.name.trim() : null,
    groups: groupsFromClaim(claims[settings.groupsClaim]),
  }, settings.groupRoles, now);
}

export async function completeSsoSignIn(
  db: Db,
  input: { settings: SsoSettingsRow; pending: PendingSignIn | null; query: CallbackQuery; redirectUri: string; now: Date;
    userAgent: string | null; address: string | null },
): Promise<{ token: string }> {
  const { now } = input;
  let userId: string;
  try {
    userId = await userIdFromCallback(db, input.settings, input.pending, input.query, input.redirectUri, now);
  } catch (err) {
    if (err instanceof SsoSignInError) {
      await insertAuditEntry(db, { actorId: null, action: 'sso-sign-in-refused', entity: 'session', after: { reason: err.reason }, at: now });
    }
    throw err;
  }
  const { token, sessionId } = await createSession(db, { userId, now, userAgent: input.userAgent, address: input.address });
  await insertAuditEntry(db, { actorId: userId, action: 'sign-in', entity: 'session', entityId: sessionId, after: { method: 'single sign-on' }, at: now });
  return { token };
}
