// GET /api/me: the signed-in user; its one-time codes under /api/me/otp, its sessions under /api/me/sessions,
// its time zone under /api/me/time-zone, its calendar feed address under /api/me/calendar-feed, its password
// under /api/me/password.
import express, { type Router } from 'express';
import { meSchema } from '../../shared/api';
import { currentUser, requireAuth } from '../auth/guards';
import { toPublicSession } from '../auth/sessions';
import type { SignInLimit } from '../auth/sign-in-limit';
import type { RouteDeps } from './deps';
import { calendarFeedRouter } from './me/calendar-feed';
import { otpRouter } from './me/otp';
import { passwordRouter } from './me/password';
import { sessionsRouter } from './me/sessions';
import { timeZoneRouter } from './me/time-zone';

export function meRouter(deps: RouteDeps & { signInLimit: SignInLimit }): Router {
  const router = express.Router();
  router.use('/otp', otpRouter(deps));
  router.use('/sessions', sessionsRouter(deps));
  router.use('/time-zone', timeZoneRouter(deps));
  router.use('/calendar-feed', calendarFeedRouter(deps));
  router.use('/password', passwordRouter(deps));
  router.get('/', requireAuth, (req, res) => {
    res.json(meSchema.parse(toPublicSession({ user: currentUser(req) }).user));
  });
  return router;
}
