// GET /api/windows/:id/pack (the change-board pack as data) and GET /api/windows/:id/moves.csv (its moves for
// field teams): operator staff only; for a tenant user the window is not found (404), as on every internal route.
import express, { type Request, type Router } from 'express';
import { changePackSchema } from '../../../shared/change-pack';
import { CHANGE_PACK_READER_ROLES } from '../../../shared/permissions';
import { NETWORK_TIME_ZONE } from '../../../shared/time-zone';
import { currentUser, hideFromTenants, requireRole } from '../../auth/guards';
import { changePack } from '../../services/pack/change-pack';
import { NoPlanToListError } from '../../services/pack/errors';
import { movesCsv, movesFileName } from '../../services/pack/moves-csv';
import { WindowNotFoundError } from '../../services/windows/errors';
import type { RouteDeps } from '../deps';

const idOf = (req: Request) => String(req.params.id);
const readers = [hideFromTenants((req) => new WindowNotFoundError(idOf(req))), requireRole(...CHANGE_PACK_READER_ROLES)];

export function windowPackRouter({ db, now }: RouteDeps): Router {
  const router = express.Router();
  router.get('/:id/pack', ...readers, async (req, res) => {
    res.json(changePackSchema.parse(await changePack(db, idOf(req), now())));
  });
  router.get('/:id/moves.csv', ...readers, async (req, res) => {
    const pack = await changePack(db, idOf(req), now());
    if (!pack.plan) throw new NoPlanToListError(pack.window.title);
    const w = pack.window;
    const csv = movesCsv(pack.plan.steps, {
      title: w.title, startsAt: new Date(w.startsAt), endsAt: new Date(w.endsAt), afterWindow: pack.plan.afterWindow,
    }, currentUser(req).timeZone ?? NETWORK_TIME_ZONE);
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('Content-Disposition', `attachment; filename="${movesFileName(w.title)}"`);
    res.send(csv);
  });
  return router;
}
