// /api/me/time-zone: the signed-in user chooses the zone every screen shows times in (null = the network's zone).
import express, { type Router } from 'express';
import { meSchema } from '../../../shared/api';
import { timeZoneUpdateSchema } from '../../../shared/time-zone';
import { currentUser, requireAuth } from '../../auth/guards';
import { toPublicSession } from '../../auth/sessions';
import { insertAuditEntry } from '../../queries/audit/audit-log';
import { getUserById, setUserTimeZone } from '../../queries/auth/users';
import { UnauthenticatedError } from '../../errors';
import type { RouteDeps } from '../deps';

export function timeZoneRouter({ db, now }: RouteDeps): Router {
  const router = express.Router();
  // Any signed-in user, staff or tenant, sets only their own zone: the id comes from the session, never the body.
  router.patch('/', requireAuth, async (req, res) => {
    const { timeZone } = timeZoneUpdateSchema.parse(req.body);
    const { id } = currentUser(req);
    await db.transaction(async (tx) => {
      const { before } = await setUserTimeZone(tx, { id, timeZone });
      await insertAuditEntry(tx, { actorId: id, action: 'user.time-zone', entity: 'user', entityId: id, before: { timeZone: before }, after: { timeZone }, at: now() });
    });
    const user = await getUserById(db, { id });
    if (!user) throw new UnauthenticatedError();
    res.json(meSchema.parse(toPublicSession({ user }).user));
  });
  return router;
}
