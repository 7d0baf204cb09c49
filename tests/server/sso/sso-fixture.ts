// SSO test set-up: a scratch database (the settings are one row for the whole instance, so these suites keep it
// away from the others), the app, the local issuer, and a sign-in helper walking the whole flow.
import request from 'supertest';
import type express from 'express';
import type { DevIdentity } from '../../../scripts/oidc-identities';
import { ssoRedirectUri } from '../../../server/auth/sso/settings';
import { SSO_PENDING_COOKIE } from '../../../server/auth/sso/pending-cookie';
import { signInAs } from '../helpers/sign-in';
import { useScratchDatabase } from '../helpers/scratch-database';
import { setupTestApp, type TestContext } from '../helpers/test-app';
import { signInAtIssuer, startLocalIssuer, TEST_CLIENT_ID, TEST_CLIENT_SECRET, type LocalIssuer } from './local-issuer';

export const GROUP_ROLES = [
  { group: 'slackwater-admins', roles: ['admin'] },
  { group: 'noc-engineers', roles: ['engineer'] },
  { group: 'network-planning', roles: ['planner'] },
  { group: 'change-board', roles: ['approver'] },
];

export type SsoContext = TestContext & { issuer: LocalIssuer; adminCookie: string; settings: Record<string, unknown> };

export const person = (login: string, prefix: string, groups: string[], email?: string): DevIdentity =>
  ({ login, name: `Person ${login}`, email: email ?? `${login}.${prefix}@sso.example`, groups });

export async function setupSso(scratch: string, people: (prefix: string) => DevIdentity[]): Promise<SsoContext> {
  await useScratchDatabase(scratch);
  const ctx = await setupTestApp();
  const issuer = await startLocalIssuer(ssoRedirectUri(ctx.config.publicUrl), people(ctx.prefix));
  const adminCookie = await signInAs(ctx.app, ctx.users.admin.email);
  const settings = {
    enabled: true, issuerUrl: issuer.url, clientId: TEST_CLIENT_ID, clientSecret: TEST_CLIENT_SECRET,
    displayName: 'Harbourline staff login', groupsClaim: 'groups', groupRoles: GROUP_ROLES, passwordSignInForStaff: true,
  };
  const res = await request(ctx.app).put('/api/sso').set('Cookie', adminCookie).send(settings);
  if (res.status !== 200) throw new Error(`saving SSO settings failed: ${res.status} ${JSON.stringify(res.body)}`);
  return { ...ctx, issuer, adminCookie, settings, close: async () => { await issuer.stop(); await ctx.close(); } };
}

/** "slackwater_sso=<value>" from /start's answer. */
export function pendingCookieFrom(res: request.Response): string {
  const lines = (res.headers['set-cookie'] as unknown as string[] | undefined) ?? [];
  const line = lines.find((l) => l.startsWith(`${SSO_PENDING_COOKIE}=`));
  if (!line) throw new Error(`no ${SSO_PENDING_COOKIE} cookie (status ${res.status})`);
  return line.split(';')[0];
}

/** The whole flow for `login`; `alter` may change the authorization address before the browser follows it. */
export async function ssoSignIn(
  app: express.Application, login: string,
  { alter, callbackApp }: { alter?: (url: URL) => void; callbackApp?: express.Application } = {},
): Promise<request.Response> {
  const start = await request(app).get('/api/auth/sso/start');
  if (start.status !== 302) throw new Error(`start answered ${start.status}: ${JSON.stringify(start.body)}`);
  const url = new URL(start.headers.location);
  alter?.(url);
  const callback = await signInAtIssuer(url.toString(), login);
  return request(callbackApp ?? app).get(callback).set('Cookie', pendingCookieFrom(start));
}
