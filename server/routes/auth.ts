// POST /api/auth/sign-in and /api/auth/sign-out.
import express, { type Router } from 'express';
import { signInRequestSchema, signInResponseSchema } from '../../shared/api';
import { clearSessionCookie, setSessionCookie } from '../auth/session-cookie';
import { toPublicSession } from '../auth/sessions';
import { signIn, signOut } from '../auth/sign-in';
import { signInRateLimit, type SignInLimit } from '../auth/sign-in-limit';
import type { RouteDeps } from './deps';

export function authRouter({ db, config, now, signInLimit }: RouteDeps & { signInLimit: SignInLimit }): Router {
  const router = express.Router();
  router.post('/sign-in', signInRateLimit(signInLimit), async (req, res) => {
    const { email, password } = signInRequestSchema.parse(req.body);
    const { token, user } = await signIn(db, { email, password, now: now() });
    setSessionCookie(req, res, { token, maxAgeSeconds: config.sessionInactivitySeconds, secureMode: config.cookieSecure });
    res.json(signInResponseSchema.parse(toPublicSession({ user })));
  });
  // Signing out without a session is not an error: the outcome the caller wants already holds.
  router.post('/sign-out', async (req, res) => {
    if (req.auth) await signOut(db, { sessionId: req.auth.sessionId, userId: req.auth.user.id, now: now() });
    clearSessionCookie(req, res, config.cookieSecure);
    res.status(204).end();
  });
  return router;
}
