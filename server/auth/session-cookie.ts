// The session cookie: HttpOnly, SameSite=Lax, Path=/, Secure except on loopback hosts.
import type { Request, Response } from 'express';
import type { ServerConfig } from '../env';

export const SESSION_COOKIE = 'slackwater_session';

const LOOPBACK_HOSTS = new Set(['localhost', '127.0.0.1', '::1', '[::1]']);

function isLoopbackHost(hostname: string): boolean {
  return LOOPBACK_HOSTS.has(hostname) || hostname.endsWith('.localhost');
}

/** WARNING: browsers drop Secure cookies on plain http, so loopback (local use) is the one exception. */
export function isSecureCookie(req: Request, mode: ServerConfig['cookieSecure']): boolean {
  if (mode !== 'auto') return mode === 'always';
  return !isLoopbackHost(req.hostname ?? '');
}

export function setSessionCookie(
  req: Request,
  res: Response,
  { token, maxAgeSeconds, secureMode }: { token: string; maxAgeSeconds: number; secureMode: ServerConfig['cookieSecure'] },
): void {
  res.cookie(SESSION_COOKIE, token, {
    httpOnly: true,
    sameSite: 'lax',
    path: '/',
    secure: isSecureCookie(req, secureMode),
    maxAge: maxAgeSeconds * 1000,
  });
}

export function clearSessionCookie(req: Request, res: Response, secureMode: ServerConfig['cookieSecure']): void {
  res.clearCookie(SESSION_COOKIE, { httpOnly: true, sameSite: 'lax', path: '/', secure: isSecureCookie(req, secureMode) });
}

export function readSessionCookie(req: Request): string | null {
  const value: unknown = req.cookies?.[SESSION_COOKIE];
  return typeof value === 'string' && value.length > 0 ? value : null;
}
