// Invitations. Admin: POST /api/invitations (invite by e-mail), POST /api/invitations/:id/resend (a new link, the
// old one stops), DELETE /api/invitations/:id (revoke). The invitee, without a session: GET
// /api/invitations/link/:token (does the link work, for whom) and POST /api/invitations/accept (set a password,
// be signed in). The invitee's routes count attempts like sign-in does, so guessing tokens is slow.
import express, { type ErrorRequestHandler, type Request, type Router } from 'express';
import { z } from 'zod';
import { signInResponseSchema } from '../../shared/api';
import { acceptInvitationSchema, invitationLinkSchema, invitationRequestSchema, invitationSchema, invitationTokenSchema } from '../../shared/people';
import { ADMIN_ROLES } from '../../shared/permissions';
import { currentUser, requireRole } from '../auth/guards';
import { setSessionCookie } from '../auth/session-cookie';
import { toPublicSession } from '../auth/sessions';
import { releaseSignInAttempt, type SignInLimit } from '../auth/sign-in-limit';
import { reserveLinkCheck } from '../auth/link-check-limit';
import { SignInLimitedError } from '../auth/sign-in-limit-error';
import { displayAddress, userAgentLabel } from '../auth/user-agent-label';
import { requestWarnLog } from '../http/request-log';
import { acceptInvitation, checkInvitationLink } from '../services/people/accept-invitation';
import { InvitationLinkInvalidError } from '../services/people/errors';
import { createInvitation, resendInvitation, revokeInvitation } from '../services/people/invitations';
import type { RouteDeps } from './deps';

const idSchema = z.string().min(1).max(200);

const retryAfter: ErrorRequestHandler = (err, _req, res, next) => {
  if (err instanceof SignInLimitedError) res.setHeader('Retry-After', String(err.retryAfterSeconds));
  next(err);
};

export function invitationsRouter({ db, config, now, jobs, signInLimit }: RouteDeps & { signInLimit: SignInLimit }): Router {
  const router = express.Router();
  const admin = requireRole(...ADMIN_ROLES);
  const peopleDeps = (req: Request) => ({ db, jobs, publicUrl: config.publicUrl, now: now(), log: requestWarnLog(req) });

  router.get('/link/:token', async (req, res) => {
    const reservation = await reserveLinkCheck(db, { link: 'invitation', address: req.ip, limit: signInLimit, now: now() });
    const token = invitationTokenSchema.safeParse(req.params.token);
    if (!token.success) throw new InvitationLinkInvalidError();
    const link = await checkInvitationLink(db, { token: token.data, now: now() });
    await releaseSignInAttempt(db, reservation);
    res.json(invitationLinkSchema.parse(link));
  });

  router.post('/accept', async (req, res) => {
    const input = acceptInvitationSchema.parse(req.body);
    const reservation = await reserveLinkCheck(db, { link: 'invitation', address: req.ip, limit: signInLimit, now: now() });
    const { token, user } = await acceptInvitation(db, {
      ...input, now: now(), userAgent: userAgentLabel(req.get('user-agent')), address: displayAddress(req.ip),
    });
    await releaseSignInAttempt(db, reservation);
    const maxAgeSeconds = Math.min(config.sessionInactivitySeconds, config.sessionMaxAgeSeconds);
    setSessionCookie(req, res, { token, maxAgeSeconds, secureMode: config.cookieSecure });
    res.status(201).json(signInResponseSchema.parse(toPublicSession({ user })));
  });

  router.post('/', admin, async (req, res) => {
    const input = invitationRequestSchema.parse(req.body);
    res.status(201).json(invitationSchema.parse(await createInvitation(peopleDeps(req), currentUser(req), input)));
  });

  router.post('/:id/resend', admin, async (req, res) => {
    res.json(invitationSchema.parse(await resendInvitation(peopleDeps(req), currentUser(req), idSchema.parse(req.params.id))));
  });

  router.delete('/:id', admin, async (req, res) => {
    await revokeInvitation(peopleDeps(req), currentUser(req), idSchema.parse(req.params.id));
    res.status(204).end();
  });

  router.use(retryAfter);
  return router;
}
