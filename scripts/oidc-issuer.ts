// A local OpenID Connect issuer for the demo and the tests (oidc-provider), on loopback only. It knows the invented
// people in scripts/oidc-identities.ts (or the JSON list in OIDC_IDENTITIES_FILE, read again at every sign-in so a
// test can change someone's groups) and one client, Slackwater. Its login page is oidc-provider's development page:
// any password is accepted.
//   OIDC_ISSUER_PORT   port (default 8181; 0 = any free port, printed on stdout)
//   OIDC_CLIENT_ID / OIDC_CLIENT_SECRET   the client Slackwater is (defaults match the demo's seeded settings)
//   OIDC_REDIRECT_URIS comma-separated redirect URIs (default: PUBLIC_URL or http://127.0.0.1:$PORT, + /api/auth/sso/callback)
import fs from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { exportJWK, generateKeyPair } from 'jose';
import Provider, { type KoaContextWithOIDC } from 'oidc-provider';
import { DEMO_SSO_CLIENT_ID, DEMO_SSO_CLIENT_SECRET } from '../db/seed/seed-sso';
import { DEV_IDENTITIES, type DevIdentity } from './oidc-identities';

function identities(): DevIdentity[] {
  const file = process.env.OIDC_IDENTITIES_FILE;
  return file ? (JSON.parse(fs.readFileSync(file, 'utf8')) as DevIdentity[]) : DEV_IDENTITIES;
}

function redirectUris(): string[] {
  if (process.env.OIDC_REDIRECT_URIS) return process.env.OIDC_REDIRECT_URIS.split(',').map((u) => u.trim()).filter(Boolean);
  const app = (process.env.PUBLIC_URL ?? `http://127.0.0.1:${process.env.PORT ?? 8080}`).replace(/\/$/, '');
  const localhost = app.replace('://127.0.0.1', '://localhost');
  return [...new Set([app, localhost])].map((base) => `${base}/api/auth/sso/callback`);
}

/** First-party client: no consent page, the grant covers the scopes Slackwater asks for. */
async function loadExistingGrant(ctx: KoaContextWithOIDC) {
  const { oidc } = ctx;
  const grantId = oidc.result?.consent?.grantId ?? oidc.session!.grantIdFor(oidc.client!.clientId);
  if (grantId) return oidc.provider.Grant.find(grantId);
  const grant = new oidc.provider.Grant({ clientId: oidc.client!.clientId, accountId: oidc.session!.accountId });
  grant.addOIDCScope('openid profile email');
  await grant.save();
  return grant;
}

async function main(): Promise<void> {
  const server = http.createServer();
  await new Promise<void>((resolve) => server.listen(Number(process.env.OIDC_ISSUER_PORT ?? 8181), '127.0.0.1', resolve));
  const issuer = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  const { privateKey } = await generateKeyPair('RS256', { extractable: true });
  const provider = new Provider(issuer, {
    clients: [{
      client_id: process.env.OIDC_CLIENT_ID ?? DEMO_SSO_CLIENT_ID,
      client_secret: process.env.OIDC_CLIENT_SECRET ?? DEMO_SSO_CLIENT_SECRET,
      redirect_uris: redirectUris(),
      grant_types: ['authorization_code'],
      response_types: ['code'],
    }],
    jwks: { keys: [{ ...(await exportJWK(privateKey)), alg: 'RS256', use: 'sig', kid: 'local-issuer' }] },
    pkce: { methods: ['S256'], required: () => true },
    claims: { openid: ['sub'], email: ['email', 'email_verified'], profile: ['name', 'groups'] },
    // The groups and e-mail go into the ID token itself, where Slackwater reads them.
    conformIdTokenClaims: false,
    features: { devInteractions: { enabled: true } },
    loadExistingGrant,
    cookies: { keys: ['local-issuer-cookie-key-not-secret'] },
    async findAccount(_ctx, id) {
      const person = identities().find((p) => p.login === id);
      if (!person) return undefined;
      return {
        accountId: id,
        claims: async () => ({ sub: id, email: person.email, email_verified: true, name: person.name, groups: person.groups }),
      };
    },
  });
  provider.on('server_error', (_ctx, err) => console.error(`oidc-issuer: ${err.stack ?? err.message}`));
  const handle = provider.callback();
  server.on('request', (req, res) => void handle(req, res));
  console.log(`oidc-issuer: listening on ${issuer}`);
  const stop = () => server.close(() => process.exit(0));
  process.on('SIGTERM', stop);
  process.on('SIGINT', stop);
}

main().catch((err: unknown) => {
  console.error(`oidc-issuer: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
