// PUT and GET /api/windows/:id/mop: a window's method-of-procedure file; bookers upload, operator staff download.
import express, { type Request, type Router } from 'express';
import { mopInfoSchema } from '../../../shared/windows';
import { OPERATOR_ROLES, WINDOW_BOOKER_ROLES } from '../../../shared/permissions';
import { currentUser, hideFromTenants, requireRole } from '../../auth/guards';
import { getWindowDocument } from '../../queries/windows/documents';
import { MopNotFoundError, WindowNotFoundError } from '../../services/windows/errors';
import { storeMop } from '../../services/windows/mop';
import { mopUpload } from '../../http/mop-upload';
import { loadWindow } from '../../services/windows/window-view';
import type { RouteDeps } from '../deps';

const idOf = (req: Request) => String(req.params.id);
/** The MOP is internal: for a tenant user the window is not found (404, as on every internal window route). */
const windowHidden = hideFromTenants((req) => new WindowNotFoundError(idOf(req)));

export function windowMopRouter({ db, now }: RouteDeps): Router {
  const router = express.Router();
  router.put('/:id/mop', windowHidden, requireRole(...WINDOW_BOOKER_ROLES), async (req, _res, next) => {
    await loadWindow(db, idOf(req), null);
    next();
  }, mopUpload(), async (req, res) => {
    await storeMop(db, idOf(req), req.file, currentUser(req), now());
    const doc = await getWindowDocument(db, idOf(req));
    res.json(mopInfoSchema.parse({ fileName: doc!.fileName, mime: doc!.mime, sizeBytes: doc!.sizeBytes, uploadedAt: doc!.uploadedAt.toISOString() }));
  });
  router.get('/:id/mop', windowHidden, requireRole(...OPERATOR_ROLES), async (req, res) => {
    await loadWindow(db, idOf(req), null);
    const doc = await getWindowDocument(db, idOf(req));
    if (!doc) throw new MopNotFoundError();
    res.attachment(doc.fileName).type(doc.mime).send(doc.content);
  });
  return router;
}
