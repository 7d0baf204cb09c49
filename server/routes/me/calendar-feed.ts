// /api/me/calendar-feed: the signed-in user's private feed address. GET makes one when there is none; DELETE ends
// it at once (the next GET makes a new one). A feed shows windows, so it needs a role that reads them.
import express, { type Router } from 'express';
import { calendarFeedSchema } from '../../../shared/calendar-feeds';
import { WINDOW_READER_ROLES } from '../../../shared/permissions';
import { currentUser, requireRole } from '../../auth/guards';
import { getOrCreateFeed, revokeFeed } from '../../services/feeds/feed-address';
import type { RouteDeps } from '../deps';

export function calendarFeedRouter({ db, config, now }: RouteDeps): Router {
  const router = express.Router();
  const readers = requireRole(...WINDOW_READER_ROLES);
  router.get('/', readers, async (req, res) => {
    res.json(calendarFeedSchema.parse(await getOrCreateFeed(db, currentUser(req).id, now(), config.publicUrl)));
  });
  router.delete('/', readers, async (req, res) => {
    await revokeFeed(db, currentUser(req).id, now());
    res.status(204).end();
  });
  return router;
}
