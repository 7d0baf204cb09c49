// /api/me/sessions: the signed-in user's own sessions — list, end one by id, or end all ("sign out everywhere").
import express, { type Request, type Router } from 'express';
import { revokeAllSessionsResponseSchema, sessionHandleSchema, sessionListSchema } from '../../../shared/sessions';
import { requireAuth } from '../../auth/guards';
import type { SessionAuth } from '../../auth/request-auth';
import { clearSessionCookie } from '../../auth/session-cookie';
import { endAllOwnSessions, endOwnSession, listOwnSessions } from '../../auth/session-list';
import { UnauthenticatedError } from '../../errors';
import type { RouteDeps } from '../deps';

function currentSession(req: Request): SessionAuth {
  if (!req.auth) throw new UnauthenticatedError();
  return req.auth;
}

export function sessionsRouter({ db, config, now }: RouteDeps): Router {
  const router = express.Router();
  const lifetime = { inactivitySeconds: config.sessionInactivitySeconds, maxAgeSeconds: config.sessionMaxAgeSeconds };
  router.get('/', requireAuth, async (req, res) => {
    const { user, sessionId } = currentSession(req);
    const sessions = await listOwnSessions(db, { userId: user.id, currentSessionId: sessionId, now: now(), lifetime });
    res.json(sessionListSchema.parse({ sessions }));
  });
  // Ends every session of the user, this one included: after a lost device or a leaked password nothing stays open.
  router.post('/revoke-all', requireAuth, async (req, res) => {
    const ended = await endAllOwnSessions(db, { userId: currentSession(req).user.id, now: now() });
    clearSessionCookie(req, res, config.cookieSecure);
    res.json(revokeAllSessionsResponseSchema.parse({ ended }));
  });
  router.delete('/:id', requireAuth, async (req, res) => {
    const handle = sessionHandleSchema.parse(req.params.id);
    const { user, sessionId } = currentSession(req);
    const { wasCurrent } = await endOwnSession(db, { userId: user.id, currentSessionId: sessionId, handle, now: now() });
    if (wasCurrent) clearSessionCookie(req, res, config.cookieSecure);
    res.status(204).end();
  });
  return router;
}
