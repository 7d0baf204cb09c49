// The demo's single sign-on: settings pointing at the local issuer (scripts/oidc-issuer.ts, started by `npm start`),
// so "Sign in with Harbourline staff login" works out of the box. Written once; an admin's later changes stay.
import { ssoSettings } from '../schema';
import type { Tx } from '../client';

/** Where `npm start` runs the local issuer (OIDC_ISSUER_PORT's default). */
export const DEMO_ISSUER_URL = 'http://127.0.0.1:8181';
export const DEMO_SSO_CLIENT_ID = 'slackwater-demo';
/** Not a secret: the local issuer is a stand-in that accepts any password. */
export const DEMO_SSO_CLIENT_SECRET = 'demo-sso-client-secret';

/** Groups of the local issuer's invented people (scripts/oidc-identities.ts) and the roles they give. */
export const DEMO_GROUP_ROLES = [
  { group: 'slackwater-admins', roles: ['admin' as const] },
  { group: 'noc-engineers', roles: ['engineer' as const] },
  { group: 'network-planning', roles: ['planner' as const] },
  { group: 'change-board', roles: ['approver' as const] },
];

/** 1 when the settings row was written, 0 when one was already there. */
export async function seedDemoSso(tx: Tx): Promise<number> {
  const inserted = await tx.insert(ssoSettings).values({
    id: 'default', enabled: true, issuerUrl: DEMO_ISSUER_URL, clientId: DEMO_SSO_CLIENT_ID, clientSecret: DEMO_SSO_CLIENT_SECRET,
    displayName: 'Harbourline staff login', groupsClaim: 'groups', groupRoles: DEMO_GROUP_ROLES, passwordSignInForStaff: true,
  }).onConflictDoNothing().returning({ id: ssoSettings.id });
  return inserted.length;
}
