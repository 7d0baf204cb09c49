// POST /api/me/password: the signed-in user changes their own password (current one required); their other
// sessions end, this one stays.
import express, { type Router } from 'express';
import { changePasswordRequestSchema, changePasswordResponseSchema } from '../../../shared/passwords';
import { currentUser, requireAuth } from '../../auth/guards';
import { changePassword } from '../../auth/password-change';
import type { SignInLimit } from '../../auth/sign-in-limit';
import { UnauthenticatedError } from '../../errors';
import type { RouteDeps } from '../deps';

export function passwordRouter({ db, now, signInLimit }: RouteDeps & { signInLimit: SignInLimit }): Router {
  const router = express.Router();
  // Any signed-in user, staff or tenant, changes only their own password: who comes from the session, never the body.
  router.post('/', requireAuth, async (req, res) => {
    const { currentPassword, newPassword } = changePasswordRequestSchema.parse(req.body);
    if (!req.auth) throw new UnauthenticatedError();
    const user = currentUser(req);
    const result = await changePassword(db, {
      user, sessionId: req.auth.sessionId, currentPassword, newPassword, now: now(), address: req.ip, limit: signInLimit,
    });
    res.json(changePasswordResponseSchema.parse(result));
  });
  return router;
}
