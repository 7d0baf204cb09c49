// Verifies an ID token: signature against the issuer's published keys, then iss, aud, exp and the nonce we sent.
// Reference: OpenID Connect Core 1.0 §3.1.3.7 (ID token validation).
import { createRemoteJWKSet, errors, jwtVerify, type JWTPayload } from 'jose';
import { timingSafeEqual } from 'node:crypto';
import { SsoSignInError } from './errors';

/** One key set per JWKS address: jose caches keys and refetches when a token names an unknown key id. */
const keySets = new Map<string, ReturnType<typeof createRemoteJWKSet>>();
function keySetFor(jwksUri: string) {
  let set = keySets.get(jwksUri);
  if (!set) {
    set = createRemoteJWKSet(new URL(jwksUri));
    keySets.set(jwksUri, set);
  }
  return set;
}

/** Leeway for clocks that disagree a little, in seconds. */
const CLOCK_TOLERANCE_SECONDS = 30;

function sameString(a: string, b: string): boolean {
  const x = Buffer.from(a);
  const y = Buffer.from(b);
  return x.length === y.length && timingSafeEqual(x, y);
}

export async function verifyIdToken(
  idToken: string,
  expected: { issuer: string; clientId: string; nonce: string; jwksUri: string; now: Date },
): Promise<JWTPayload & { sub: string }> {
  let payload: JWTPayload;
  try {
    ({ payload } = await jwtVerify(idToken, keySetFor(expected.jwksUri), {
      issuer: expected.issuer,
      audience: expected.clientId,
      currentDate: expected.now,
      clockTolerance: CLOCK_TOLERANCE_SECONDS,
      requiredClaims: ['sub', 'exp', 'iat'],
    }));
  } catch (err) {
    if (err instanceof errors.JOSEError) throw new SsoSignInError('token', err.code);
    throw err;
  }
  // Several audiences need an azp naming us (Core §3.1.3.7 items 4 and 5).
  if (Array.isArray(payload.aud) && payload.aud.length > 1 && payload.azp !== expected.clientId) {
    throw new SsoSignInError('token', 'azp does not name this client');
  }
  if (typeof payload.nonce !== 'string' || !sameString(payload.nonce, expected.nonce)) throw new SsoSignInError('nonce');
  return payload as JWTPayload & { sub: string };
}
