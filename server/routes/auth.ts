// POST /api/auth/sign-in and /api/auth/sign-out; forgotten passwords: POST /api/auth/forgot-password (mail a reset
// link), GET /api/auth/reset-password/:token (does the link work?) and POST /api/auth/reset-password (set it).
import express, { type ErrorRequestHandler, type Router } from 'express';
import { signInRequestSchema, signInResponseSchema } from '../../shared/api';
import {
  FORGOT_PASSWORD_ANSWER, forgotPasswordRequestSchema, forgotPasswordResponseSchema, resetLinkStatusSchema,
  resetPasswordRequestSchema, resetTokenSchema,
} from '../../shared/passwords';
import { checkResetLink, requestPasswordReset, resetPassword, ResetLinkInvalidError } from '../auth/password-reset';
import { WeakPasswordError } from '../auth/password-policy';
import { countResetRequest } from '../auth/reset-request-limit';
import { clearSessionCookie, setSessionCookie } from '../auth/session-cookie';
import { toPublicSession } from '../auth/sessions';
import { signIn, signOut } from '../auth/sign-in';
import { releaseSignInAttempt, type SignInLimit } from '../auth/sign-in-limit';
import { reserveLinkCheck } from '../auth/link-check-limit';
import { SignInLimitedError } from '../auth/sign-in-limit-error';
import { userAgentLabel } from '../auth/user-agent-label';
import { requestWarnLog } from '../http/request-log';
import type { RouteDeps } from './deps';

/** A full sign-in limit says when to come back (RFC 9110 §10.2.3); the error handler writes the body. */
const retryAfter: ErrorRequestHandler = (err, _req, res, next) => {
  if (err instanceof SignInLimitedError) res.setHeader('Retry-After', String(err.retryAfterSeconds));
  next(err);
};

export function authRouter({ db, config, now, jobs, signInLimit }: RouteDeps & { signInLimit: SignInLimit }): Router {
  const router = express.Router();
  router.post('/sign-in', async (req, res) => {
    const { email, password } = signInRequestSchema.parse(req.body);
    // WARNING: req.ip is the socket's address unless TRUST_PROXY names the proxy in front (server/env.ts): then
    // X-Forwarded-For from that proxy alone counts, so nobody else can forge it to dodge the per-address limit.
    // Behind a reverse proxy without TRUST_PROXY, every client counts as the proxy's one address.
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

  // WARNING: the answer leaves before the account is even looked up, so its status, body and time are the same
  // whether or not an account uses the address. Only the request limit, counted for every address, comes first.
  router.post('/forgot-password', async (req, res) => {
    const { email } = forgotPasswordRequestSchema.parse(req.body);
    const at = now();
    await countResetRequest(db, { email, address: req.ip, now: at });
    res.status(202).json(forgotPasswordResponseSchema.parse({ message: FORGOT_PASSWORD_ANSWER }));
    void requestPasswordReset(db, jobs, { email, now: at, publicUrl: config.publicUrl })
      .catch((err: unknown) => requestWarnLog(req)('password reset request failed after the answer', err));
  });
  // Checking or using a link counts per client address like sign-in failures: guessing tokens stays slow.
  router.get('/reset-password/:token', async (req, res) => {
    const reservation = await reserveLinkCheck(db, { link: 'reset', address: req.ip, limit: signInLimit, now: now() });
    const token = resetTokenSchema.safeParse(req.params.token);
    if (!token.success) throw new ResetLinkInvalidError();
    await checkResetLink(db, { token: token.data, now: now() });
    await releaseSignInAttempt(db, reservation);
    res.json(resetLinkStatusSchema.parse({ valid: true }));
  });
  router.post('/reset-password', async (req, res) => {
    const input = resetPasswordRequestSchema.parse(req.body);
    const reservation = await reserveLinkCheck(db, { link: 'reset', address: req.ip, limit: signInLimit, now: now() });
    try {
      await resetPassword(db, { ...input, now: now() });
    } catch (err) {
      // Only a link that does not work stays counted: a refused password is no guess at a token.
      if (err instanceof WeakPasswordError) await releaseSignInAttempt(db, reservation);
      throw err;
    }
    await releaseSignInAttempt(db, reservation);
    // Every session of the account ended, possibly this browser's: the person signs in with the new password.
    clearSessionCookie(req, res, config.cookieSecure);
    res.status(204).end();
  });
  router.use(retryAfter);
  return router;
}
