// /api/windows: list, book, read, edit (optimistic locking), assess, lifecycle, impact, conflicts, MOP.
import express, { type Request, type Router } from 'express';
import { mopInfoSchema, windowCreateSchema, windowListQuerySchema, windowListSchema, windowMutationSchema,
  windowPatchSchema, windowSchema, windowStatusSchema, windowTransitionSchema, windowVersionSchema } from '../../shared/windows';
import { windowConflictsSchema, windowImpactSchema } from '../../shared/window-impact';
import { requireRole } from '../auth/guards';
import { getWindowDocument } from '../queries/windows/documents';
import { getWindowImpact } from '../queries/windows/impacts';
import type { WindowFilter } from '../queries/windows/window-rows';
import { assessWindow } from '../services/windows/assess-window';
import { scopeImpact } from '../services/windows/compute-impact';
import { conflictsByWindow } from '../services/windows/conflicts';
import { createWindow } from '../services/windows/create-window';
import { editWindow } from '../services/windows/edit-window';
import { ImpactNotFoundError, MopNotFoundError } from '../services/windows/errors';
import { mopUpload, storeMop } from '../services/windows/mop';
import { BOOKING_ROLES, STAFF_ROLES, tenantScopeOf } from '../services/windows/tenant-scope';
import { transitionWindow } from '../services/windows/transition-window';
import { loadWindow, windowView, windowViews } from '../services/windows/window-view';
import type { RouteDeps } from './deps';

const anyRole = requireRole(...STAFF_ROLES, 'tenant');
const booking = requireRole(...BOOKING_ROLES);
const staff = requireRole(...STAFF_ROLES);
const idOf = (req: Request) => String(req.params.id);

function listFilter(req: Request): WindowFilter {
  const q = windowListQuerySchema.parse(req.query);
  const statuses = q.status?.split(',').filter(Boolean).map((s) => windowStatusSchema.parse(s.trim()));
  return {
    from: new Date(q.from), to: new Date(q.to), statuses,
    ownerId: q.mine === 'true' ? req.user!.id : undefined,
    elementId: q.element || undefined, affectsTenant: q.tenant || undefined,
    scopeTenant: tenantScopeOf(req.user!),
  };
}

export function windowsRouter({ db, now, jobs, config }: RouteDeps): Router {
  const router = express.Router();
  const scope = (req: Request) => tenantScopeOf(req.user!);
  const mutation = async (id: string, reverted: boolean) => {
    const window = await windowView(db, id, null);
    return windowMutationSchema.parse({ window, reverted, conflictCount: window.conflictCount });
  };

  router.get('/', anyRole, async (req, res) => {
    res.json(windowListSchema.parse({ windows: await windowViews(db, listFilter(req)) }));
  });
  router.post('/', booking, async (req, res) => {
    const id = await createWindow(db, windowCreateSchema.parse(req.body), req.user!, now());
    res.status(201).json(await mutation(id, false));
  });
  router.get('/:id', anyRole, async (req, res) => {
    res.json(windowSchema.parse(await windowView(db, idOf(req), scope(req))));
  });
  router.patch('/:id', booking, async (req, res) => {
    const { reverted } = await editWindow(db, idOf(req), windowPatchSchema.parse(req.body), req.user!, now());
    res.json(await mutation(idOf(req), reverted));
  });
  router.post('/:id/transition', booking, async (req, res) => {
    await transitionWindow(db, idOf(req), windowTransitionSchema.parse(req.body), req.user!, now(), { jobs, config });
    res.json(await mutation(idOf(req), false));
  });
  router.post('/:id/assess', booking, async (req, res) => {
    const version = req.body?.version === undefined ? undefined : windowVersionSchema.parse(req.body).version;
    res.json(windowImpactSchema.parse(await assessWindow(db, idOf(req), { version, user: req.user!, now: now() })));
  });
  router.get('/:id/impact', anyRole, async (req, res) => {
    await loadWindow(db, idOf(req), scope(req));
    const impact = await getWindowImpact(db, idOf(req));
    if (!impact) throw new ImpactNotFoundError();
    const tenant = scope(req);
    res.json(windowImpactSchema.parse(tenant === null ? impact : scopeImpact(impact, tenant)));
  });
  router.get('/:id/conflicts', anyRole, async (req, res) => {
    const w = await loadWindow(db, idOf(req), scope(req));
    const conflicts = (await conflictsByWindow(db, [w], scope(req))).get(w.id) ?? [];
    res.json(windowConflictsSchema.parse({ windowId: w.id, conflicts }));
  });
  router.put('/:id/mop', booking, async (req, _res, next) => {
    await loadWindow(db, idOf(req), null);
    next();
  }, mopUpload(), async (req, res) => {
    await storeMop(db, idOf(req), req.file, req.user!, now());
    const doc = await getWindowDocument(db, idOf(req));
    res.json(mopInfoSchema.parse({ fileName: doc!.fileName, mime: doc!.mime, sizeBytes: doc!.sizeBytes, uploadedAt: doc!.uploadedAt.toISOString() }));
  });
  router.get('/:id/mop', staff, async (req, res) => {
    await loadWindow(db, idOf(req), null);
    const doc = await getWindowDocument(db, idOf(req));
    if (!doc) throw new MopNotFoundError();
    res.attachment(doc.fileName).type(doc.mime).send(doc.content);
  });
  return router;
}
