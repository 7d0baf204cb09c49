// The first admin of an instance started with SEED_DEMO=false: GET /api/set-up/:token (does the link work?) and
// POST /api/set-up (create the admin, sign them in). The only API routes besides sign-in that need no session; the
// Origin check still applies to the POST, and both count failed attempts like sign-in does.
import express, { type ErrorRequestHandler, type Router } from 'express';
import { signInResponseSchema } from '../../shared/api';
import { setUpLinkStatusSchema, setUpRequestSchema, setUpTokenSchema } from '../../shared/setup';
import { assertPasswordAcceptable } from '../auth/password-policy';
import { setSessionCookie } from '../auth/session-cookie';
import { toPublicSession } from '../auth/sessions';
import { releaseSignInAttempt, reserveSignInAttempt, signInKeys, type SignInLimit } from '../auth/sign-in-limit';
import { reserveLinkCheck } from '../auth/link-check-limit';
import { SignInLimitedError } from '../auth/sign-in-limit-error';
import { displayAddress, userAgentLabel } from '../auth/user-agent-label';
import { checkSetUpLink, completeSetUp } from '../services/setup/first-admin';
import { SetUpLinkInvalidError } from '../services/setup/errors';
import type { RouteDeps } from './deps';

const retryAfter: ErrorRequestHandler = (err, _req, res, next) => {
  if (err instanceof SignInLimitedError) res.setHeader('Retry-After', String(err.retryAfterSeconds));
  next(err);
};

export function setUpRouter({ db, config, now, signInLimit }: RouteDeps & { signInLimit: SignInLimit }): Router {
  const router = express.Router();

  router.get('/:token', async (req, res) => {
    // Link checks count per client address (the account key is the address too): guessing tokens is slow.
    const reservation = await reserveLinkCheck(db, { link: 'set-up', address: req.ip, limit: signInLimit, now: now() });
    const token = setUpTokenSchema.safeParse(req.params.token);
    if (!token.success) throw new SetUpLinkInvalidError();
    await checkSetUpLink(db, { token: token.data, now: now() });
    await releaseSignInAttempt(db, reservation);
    res.json(setUpLinkStatusSchema.parse({ valid: true }));
  });

  router.post('/', async (req, res) => {
    const input = setUpRequestSchema.parse(req.body);
    // The first admin's password meets the same policy as every other (a refusal costs no limited attempt).
    assertPasswordAcceptable(input.password, input);
    const reservation = await reserveSignInAttempt(db, { keys: signInKeys(input.email, req.ip), limit: signInLimit, now: now() });
    const { token, user } = await completeSetUp(db, {
      ...input, now: now(), userAgent: userAgentLabel(req.get('user-agent')), address: displayAddress(req.ip),
    });
    await releaseSignInAttempt(db, reservation);
    const maxAgeSeconds = Math.min(config.sessionInactivitySeconds, config.sessionMaxAgeSeconds);
    setSessionCookie(req, res, { token, maxAgeSeconds, secureMode: config.cookieSecure });
    res.status(201).json(signInResponseSchema.parse(toPublicSession({ user })));
  });

  router.use(retryAfter);
  return router;
}
