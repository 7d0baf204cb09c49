// OpenID Connect discovery: the issuer's endpoints from <issuer>/.well-known/openid-configuration
// Reference: OpenID Connect Discovery 1.0 §4 (the issuer value must equal the configured issuer exactly).
import { z } from 'zod';
import { SsoSignInError } from './errors';

const discoverySchema = z.object({
  issuer: z.string(),
  authorization_endpoint: z.url(),
  token_endpoint: z.url(),
  jwks_uri: z.url(),
});
export type IssuerMetadata = { issuer: string; authorizationEndpoint: string; tokenEndpoint: string; jwksUri: string };

/** WARNING: bounded, so a stalled issuer cannot hold a sign-in request open for minutes. */
const DISCOVERY_TIMEOUT_MS = 10_000;

export async function discoverIssuer(issuerUrl: string, fetchFn: typeof fetch = fetch): Promise<IssuerMetadata> {
  let body: unknown;
  try {
    const res = await fetchFn(`${issuerUrl}/.well-known/openid-configuration`, {
      headers: { accept: 'application/json' }, signal: AbortSignal.timeout(DISCOVERY_TIMEOUT_MS),
    });
    if (!res.ok) throw new Error(`discovery answered ${res.status}`);
    body = await res.json();
  } catch (err) {
    throw new SsoSignInError('issuer', err instanceof Error ? err.message : String(err));
  }
  const parsed = discoverySchema.safeParse(body);
  if (!parsed.success) throw new SsoSignInError('issuer', 'discovery document is incomplete');
  // A document naming another issuer could hand us someone else's keys (Discovery §4.3).
  if (parsed.data.issuer.replace(/\/+$/, '') !== issuerUrl) throw new SsoSignInError('issuer', 'issuer mismatch');
  const d = parsed.data;
  return { issuer: d.issuer, authorizationEndpoint: d.authorization_endpoint, tokenEndpoint: d.token_endpoint, jwksUri: d.jwks_uri };
}
