// Private calendar feeds. /api/me/calendar-feed: the signed-in user's subscription address (GET makes one when
// there is none; DELETE ends it at once). /feeds/<token>.ics: the feed itself, for calendar apps that carry no
// session cookie; the token in the address is the only credential.
import express, { type Router } from 'express';
import { calendarFeedSchema } from '../../shared/calendar-feeds';
import { WINDOW_READER_ROLES } from '../../shared/permissions';
import { currentUser, requireRole } from '../auth/guards';
import { FeedNotFoundError } from '../services/feeds/errors';
import { feedCalendar } from '../services/feeds/feed-answer';
import { getOrCreateFeed, revokeFeed } from '../services/feeds/feed-address';
import type { RouteDeps } from './deps';

/** Mounted at /api/me/calendar-feed. A feed shows windows, so it needs a role that reads them. */
export function myCalendarFeedRouter({ db, config, now }: RouteDeps): Router {
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

/** Mounted at /feeds, before sessions: no cookie is read or set here. */
export function feedsRouter({ db, config, now }: Pick<RouteDeps, 'db' | 'config' | 'now'>): Router {
  const router = express.Router();
  router.get('/:file', async (req, res) => {
    const match = /^(.+)\.ics$/.exec(String(req.params.file));
    if (!match) throw new FeedNotFoundError();
    const ics = await feedCalendar(db, match[1], now(), config);
    // The feed is one person's: no shared cache may keep it, and a replaced address must stop answering at once.
    res.setHeader('Cache-Control', 'no-store');
    res.setHeader('Content-Disposition', 'inline; filename="slackwater.ics"');
    res.type('text/calendar; charset=utf-8').send(ics);
  });
  return router;
}
