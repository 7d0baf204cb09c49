// POST /api/auth/sign-in and /api/auth/sign-out.
import express, { type ErrorRequestHandler, type Router } from 'express';
import { signInRequestSchema, signInResponseSchema } from '../../shared/api';
import { clearSessionCookie, setSessionCookie } from '../auth/session-cookie';
import { toPublicSession } from '../auth/sessions';
import { signIn, signOut } from '../auth/sign-in';
import type { SignInLimit } from '../auth/sign-in-limit';
import { SignInLimitedError } from '../auth/sign-in-limit-error';
import { userAgentLabel } from '../auth/user-agent-label';
import type { RouteDeps } from './deps';

/** A full sign-in limit says when to come back (RFC 9110 §10.2.3); the error handler writes the body. */
const retryAfter: ErrorRequestHandler = (err, _req, res, next) => {
  if (err instanceof SignInLimitedError) res.setHeader('Retry-After', String(err.retryAfterSeconds));
  next(err);
};

export function authRouter({ db, config, now, signInLimit }: RouteDeps & { signInLimit: SignInLimit }): Router {
  const router = express.Router();
  router.post('/sign-in', async (req, res) => {
    const { email, password } = signInRequestSchema.parse(req.body);
    // WARNING: req.ip is the socket's address: `trust proxy` is not set (server/app.ts), so X-Forwarded-For is
    // ignored and cannot be forged to dodge the per-address limit. Behind a reverse proxy, set `trust proxy` to
    // that proxy, or every client counts as the proxy's one address.
    const { token, user } = await signIn(db, {
      email, password, now: now(), address: req.ip, userAgent: userAgentLabel(req.get('user-agent')), limit: signInLimit,
    });
    const maxAgeSeconds = Math.min(config.sessionInactivitySeconds, config.sessionMaxAgeSeconds);
    setSessionCookie(req, res, { token, maxAgeSeconds, secureMode: config.cookieSecure });
    res.json(signInResponseSchema.parse(toPublicSession({ user })));
  });
  // Signing out without a session is not an error: the outcome the caller wants already holds.
  router.post('/sign-out', async (req, res) => {
    if (req.auth) await signOut(db, { sessionId: req.auth.sessionId, userId: req.auth.user.id, now: now() });
    clearSessionCookie(req, res, config.cookieSecure);
    res.status(204).end();
  });
  router.use(retryAfter);
  return router;
}
