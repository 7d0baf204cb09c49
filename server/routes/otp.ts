// /api/me/otp: a staff user sets up one-time codes (enrol → confirm with a first code), reads the state, removes them.
import express, { type Router } from 'express';
import { otpConfirmBodySchema, otpEnrolmentSchema, otpStatusSchema } from '../../shared/signoff';
import { requireRole } from '../auth/guards';
import { withOtpAttempt } from '../auth/otp-attempts';
import { confirmOtp, enrolOtp, getOtpStatus, removeOtp, spendOtpCode } from '../auth/otp-keys';
import { STAFF_ROLES } from '../services/windows/tenant-scope';
import type { RouteDeps } from './deps';

const staff = requireRole(...STAFF_ROLES);

export function otpRouter({ db, now }: RouteDeps): Router {
  const router = express.Router();
  router.get('/', staff, async (req, res) => {
    res.json(otpStatusSchema.parse(await getOtpStatus(db, req.user!.id)));
  });
  router.post('/enrol', staff, async (req, res) => {
    const enrolment = await db.transaction((tx) => enrolOtp(tx, req.user!, now()));
    res.status(201).json(otpEnrolmentSchema.parse(enrolment));
  });
  router.post('/confirm', staff, async (req, res) => {
    const { code } = otpConfirmBodySchema.parse(req.body);
    const at = now();
    const status = await withOtpAttempt(db, req.user!.id, at, () => db.transaction((tx) => confirmOtp(tx, req.user!.id, code, at)));
    res.json(otpStatusSchema.parse(status));
  });
  // A confirmed key is removed only with a current code: otherwise a stolen session could swap in its own
  // authenticator. A lost phone is an admin's reset (DELETE /api/signoff/otp-keys/:userId).
  router.delete('/', staff, async (req, res) => {
    const at = now();
    await withOtpAttempt(db, req.user!.id, at, () => db.transaction(async (tx) => {
      if ((await getOtpStatus(tx, req.user!.id)).enrolled) {
        await spendOtpCode(tx, req.user!.id, otpConfirmBodySchema.parse(req.body ?? {}).code, at);
      }
      await removeOtp(tx, req.user!.id, req.user!.id, at);
    }));
    res.status(204).end();
  });
  return router;
}
