// The authorization-code flow with PKCE (S256), state and nonce, on arctic's generic OAuth 2.0 client.
// Reference: RFC 7636 (PKCE); OpenID Connect Core 1.0 §3.1 (authorization code flow).
import { ArcticFetchError, CodeChallengeMethod, OAuth2Client, OAuth2RequestError, generateCodeVerifier, generateState } from 'arctic';
import type { IssuerMetadata } from './discovery';
import { SsoSignInError } from './errors';

/** What the browser keeps between leaving for the issuer and coming back (HttpOnly cookie, a few minutes). */
export type PendingSignIn = { issuer: string; state: string; nonce: string; verifier: string };

export const SSO_SCOPES = ['openid', 'profile', 'email'];

export function startSignIn(
  settings: { issuerUrl: string; clientId: string; clientSecret: string },
  metadata: IssuerMetadata,
  redirectUri: string,
): { url: URL; pending: PendingSignIn } {
  const client = new OAuth2Client(settings.clientId, settings.clientSecret, redirectUri);
  const state = generateState();
  const nonce = generateState();
  const verifier = generateCodeVerifier();
  const url = client.createAuthorizationURLWithPKCE(metadata.authorizationEndpoint, state, CodeChallengeMethod.S256, verifier, SSO_SCOPES);
  url.searchParams.set('nonce', nonce);
  return { url, pending: { issuer: settings.issuerUrl, state, nonce, verifier } };
}

/** Trades the code for tokens at the issuer's token endpoint; the ID token, or a refusal naming why. */
export async function exchangeCode(
  settings: { clientId: string; clientSecret: string },
  metadata: IssuerMetadata,
  redirectUri: string,
  { code, verifier }: { code: string; verifier: string },
): Promise<string> {
  const client = new OAuth2Client(settings.clientId, settings.clientSecret, redirectUri);
  try {
    const tokens = await client.validateAuthorizationCode(metadata.tokenEndpoint, code, verifier);
    return tokens.idToken();
  } catch (err) {
    if (err instanceof OAuth2RequestError) throw new SsoSignInError('token', err.code);
    if (err instanceof ArcticFetchError) throw new SsoSignInError('issuer', err.message);
    throw new SsoSignInError('token', err instanceof Error ? err.message : String(err));
  }
}
