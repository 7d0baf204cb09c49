// The short-lived cookie that carries state, nonce and PKCE verifier from /start to /callback.
import type { Request, Response } from 'express';
import { z } from 'zod';
import type { ServerConfig } from '../../env';
import { isSecureCookie } from '../session-cookie';
import type { PendingSignIn } from './flow';

export const SSO_PENDING_COOKIE = 'slackwater_sso';
/** Only the callback reads it. */
const COOKIE_PATH = '/api/auth/sso';
/** Time to sign in at the issuer, in seconds. */
export const SSO_PENDING_SECONDS = 10 * 60;

const pendingSchema = z.object({ issuer: z.string(), state: z.string(), nonce: z.string(), verifier: z.string() });

export function setPendingCookie(req: Request, res: Response, pending: PendingSignIn, secureMode: ServerConfig['cookieSecure']): void {
  // WARNING: SameSite=Lax, not Strict: the issuer's redirect back is a cross-site top-level GET, which Lax allows.
  res.cookie(SSO_PENDING_COOKIE, Buffer.from(JSON.stringify(pending)).toString('base64url'), {
    httpOnly: true, sameSite: 'lax', path: COOKIE_PATH, secure: isSecureCookie(req, secureMode), maxAge: SSO_PENDING_SECONDS * 1000,
  });
}

export function readPendingCookie(req: Request): PendingSignIn | null {
  const raw: unknown = req.cookies?.[SSO_PENDING_COOKIE];
  if (typeof raw !== 'string') return null;
  try {
    const parsed = pendingSchema.safeParse(JSON.parse(Buffer.from(raw, 'base64url').toString('utf8')));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}

export function clearPendingCookie(req: Request, res: Response, secureMode: ServerConfig['cookieSecure']): void {
  res.clearCookie(SSO_PENDING_COOKIE, { httpOnly: true, sameSite: 'lax', path: COOKIE_PATH, secure: isSecureCookie(req, secureMode) });
}
