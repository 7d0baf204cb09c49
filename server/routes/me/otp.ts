// /api/me/otp: an operator user sets up one-time codes (enrol → confirm with a first code), reads the state, removes them.
import express, { type Router } from 'express';
import { OPERATOR_ROLES } from '../../../shared/permissions';
import { otpConfirmBodySchema, otpEnrolmentSchema, otpStatusSchema } from '../../../shared/signoff';
import { currentUser, requireRole } from '../../auth/guards';
import { withOtpAttempt } from '../../auth/otp-attempts';
import { confirmOtp, enrolOtp, getOtpStatus, removeOtp, spendOtpCode } from '../../auth/otp-keys';
import type { RouteDeps } from '../deps';

const operator = requireRole(...OPERATOR_ROLES);

export function otpRouter({ db, now }: RouteDeps): Router {
  const router = express.Router();
  router.get('/', operator, async (req, res) => {
    res.json(otpStatusSchema.parse(await getOtpStatus(db, currentUser(req).id)));
  });
  router.post('/enrol', operator, async (req, res) => {
    const user = currentUser(req);
    const enrolment = await db.transaction((tx) => enrolOtp(tx, user, now()));
    res.status(201).json(otpEnrolmentSchema.parse(enrolment));
  });
  router.post('/confirm', operator, async (req, res) => {
    const { code } = otpConfirmBodySchema.parse(req.body);
    const { id } = currentUser(req);
    const at = now();
    const status = await withOtpAttempt(db, id, at, (tx) => confirmOtp(tx, id, code, at));
    res.json(otpStatusSchema.parse(status));
  });
  // A confirmed key is removed only with a current code: otherwise a stolen session could swap in its own
  // authenticator. A lost phone is an admin's reset (DELETE /api/signoff/otp-keys/:userId).
  router.delete('/', operator, async (req, res) => {
    const { id } = currentUser(req);
    const at = now();
    await withOtpAttempt(db, id, at, async (tx) => {
      if ((await getOtpStatus(tx, id)).enrolled) {
        await spendOtpCode(tx, id, otpConfirmBodySchema.parse(req.body ?? {}).code, at);
      }
      await removeOtp(tx, id, id, at);
    });
    res.status(204).end();
  });
  return router;
}
