// GET /api/calendar-feeds/<token>.ics: a private calendar feed, for calendar apps that carry no session cookie; the
// token in the address is the only credential (the owner gets the address from /api/me/calendar-feed).
import express, { type Router } from 'express';
import { FeedNotFoundError } from '../services/feeds/errors';
import { feedCalendar } from '../services/feeds/feed-answer';
import type { RouteDeps } from './deps';

/** Mounted before sessions: no cookie is read or set here. */
export function calendarFeedsRouter({ db, config, now }: Pick<RouteDeps, 'db' | 'config' | 'now'>): Router {
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
