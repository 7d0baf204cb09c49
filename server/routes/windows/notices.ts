// GET /api/windows/:id/notices: a window's tenant notices with their sending state (window notice readers).
import express, { type Request, type Router } from 'express';
import { windowNoticesSchema } from '../../../shared/notices';
import { WINDOW_NOTICE_READER_ROLES } from '../../../shared/permissions';
import { hideFromTenants, requireRole } from '../../auth/guards';
import { windowNoticeRows } from '../../services/notices/notice-views';
import { WindowNotFoundError } from '../../services/windows/errors';
import { loadWindow } from '../../services/windows/window-view';
import type { RouteDeps } from '../deps';

const idOf = (req: Request) => String(req.params.id);
/** Every tenant's sending state: for a tenant user the route's window is not found (its own notice is /api/notices/:id). */
const windowHidden = hideFromTenants((req) => new WindowNotFoundError(idOf(req)));

export function windowNoticesRouter({ db }: RouteDeps): Router {
  const router = express.Router();
  router.get('/:id/notices', windowHidden, requireRole(...WINDOW_NOTICE_READER_ROLES), async (req, res) => {
    await loadWindow(db, idOf(req), null);
    res.json(windowNoticesSchema.parse({ windowId: idOf(req), notices: await windowNoticeRows(db, idOf(req)) }));
  });
  return router;
}
