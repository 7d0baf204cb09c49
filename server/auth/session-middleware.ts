// Reads the session cookie on every request and sets req.user / req.auth when it is valid.
import type { RequestHandler } from 'express';
import type { Db } from '../../db/client';
import type { ServerConfig } from '../env';
import { clearSessionCookie, readSessionCookie, setSessionCookie } from './session-cookie';
import { validateSessionToken } from './sessions';

export function sessionMiddleware(deps: { db: Db; config: ServerConfig; now: () => Date }): RequestHandler {
  const { db, config, now } = deps;
  return async (req, res, next) => {
    const token = readSessionCookie(req);
    if (!token) return next();
    const at = now();
    const auth = await validateSessionToken(db, token, {
      now: at, inactivitySeconds: config.sessionInactivitySeconds, maxAgeSeconds: config.sessionMaxAgeSeconds,
    });
    if (!auth) {
      // A stale or forged cookie is dropped so the browser stops sending it.
      clearSessionCookie(req, res, config.cookieSecure);
      return next();
    }
    req.auth = auth;
    req.user = auth.user;
    if (auth.refreshed) {
      // The cookie lives as long as the session can: never past the absolute lifetime.
      const maxAgeSeconds = Math.ceil((auth.expiresAt.getTime() - at.getTime()) / 1000);
      setSessionCookie(req, res, { token, maxAgeSeconds, secureMode: config.cookieSecure });
    }
    next();
  };
}
