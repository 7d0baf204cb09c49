// /api/windows: list, book, read, edit (optimistic locking), assess, lifecycle, impact, conflicts; the sub-resources
// (MOP, sign-off submission, plans, notices) live in routes/windows/ and are mounted here.
import express, { type Request, type Router } from 'express';
import { windowCreateSchema, windowListQuerySchema, windowListSchema, windowMutationSchema,
  windowPatchSchema, windowSchema, windowStatusSchema, windowTransitionSchema, windowVersionSchema } from '../../shared/windows';
import { windowConflictsSchema, windowImpactSchema } from '../../shared/window-impact';
import { tenantScopeOf, WINDOW_BOOKER_ROLES, WINDOW_READER_ROLES } from '../../shared/permissions';
import { currentUser, requireRole } from '../auth/guards';
import { getWindowImpact } from '../queries/windows/impacts';
import type { WindowFilter } from '../queries/windows/window-rows';
import { assessWindow } from '../services/windows/assess-window';
import { scopeImpact } from '../services/windows/compute-impact';
import { conflictsByWindow } from '../services/windows/conflicts';
import { createWindow } from '../services/windows/create-window';
import { editWindow } from '../services/windows/edit-window';
import { ImpactNotFoundError } from '../services/windows/errors';
import { transitionWindow } from '../services/windows/transition-window';
import { loadWindow, windowView, windowViews } from '../services/windows/window-view';
import type { RouteDeps } from './deps';
import { windowMopRouter } from './windows/mop';
import { windowNoticesRouter } from './windows/notices';
import { windowPlansRouter } from './windows/plans';
import { windowSubmitRouter } from './windows/submit';

const anyRole = requireRole(...WINDOW_READER_ROLES);
const booking = requireRole(...WINDOW_BOOKER_ROLES);
const idOf = (req: Request) => String(req.params.id);

function listFilter(req: Request): WindowFilter {
  const q = windowListQuerySchema.parse(req.query);
  const statuses = q.status?.split(',').filter(Boolean).map((s) => windowStatusSchema.parse(s.trim()));
  return {
    from: new Date(q.from), to: new Date(q.to), statuses,
    ownerId: q.mine === 'true' ? currentUser(req).id : undefined,
    elementId: q.element || undefined, affectsTenant: q.tenant || undefined,
    scopeTenant: tenantScopeOf(currentUser(req)),
  };
}

export function windowsRouter(deps: RouteDeps): Router {
  const { db, now, jobs, config } = deps;
  const router = express.Router();
  const scope = (req: Request) => tenantScopeOf(currentUser(req));
  const mutation = async (id: string, reverted: boolean) => {
    const window = await windowView(db, id, null);
    return windowMutationSchema.parse({ window, reverted, conflictCount: window.conflictCount });
  };

  router.get('/', anyRole, async (req, res) => {
    res.json(windowListSchema.parse({ windows: await windowViews(db, listFilter(req)) }));
  });
  router.post('/', booking, async (req, res) => {
    const id = await createWindow(db, windowCreateSchema.parse(req.body), currentUser(req), now());
    res.status(201).json(await mutation(id, false));
  });
  router.get('/:id', anyRole, async (req, res) => {
    res.json(windowSchema.parse(await windowView(db, idOf(req), scope(req))));
  });
  router.patch('/:id', booking, async (req, res) => {
    const { reverted } = await editWindow(db, idOf(req), windowPatchSchema.parse(req.body), currentUser(req), now());
    res.json(await mutation(idOf(req), reverted));
  });
  router.post('/:id/transition', booking, async (req, res) => {
    await transitionWindow(db, idOf(req), windowTransitionSchema.parse(req.body), currentUser(req), now(), { jobs, config });
    res.json(await mutation(idOf(req), false));
  });
  router.post('/:id/assess', booking, async (req, res) => {
    const version = req.body?.version === undefined ? undefined : windowVersionSchema.parse(req.body).version;
    res.json(windowImpactSchema.parse(await assessWindow(db, idOf(req), { version, user: currentUser(req), now: now() })));
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
  // Each sub-resource router holds full '/:id/...' paths, so none shadows another or the routes above.
  router.use(windowMopRouter(deps));
  router.use(windowSubmitRouter(deps));
  router.use(windowPlansRouter(deps));
  router.use(windowNoticesRouter(deps));
  return router;
}
