// /api/windows: list, book, read, edit (optimistic locking), assess, lifecycle, impact, conflicts; the sub-resources
// (MOP, history, sign-off submission, plans, notices, change-board pack) live in routes/windows/ and are mounted here. A tenant user reads only
// tenant views (list and one window, from its notices); everything else about a window is not found for it.
import express, { type Request, type Router } from 'express';
import { windowCreateSchema, windowListQuerySchema, windowListSchema, windowMutationSchema,
  windowPatchSchema, windowSchema, windowStatusSchema, windowTransitionSchema, windowVersionSchema } from '../../shared/windows';
import { windowConflictsSchema } from '../../shared/window-impact';
import { tenantScopeOf, WINDOW_BOOKER_ROLES, WINDOW_READER_ROLES } from '../../shared/permissions';
import { tenantWindowListSchema, tenantWindowViewSchema } from '../../shared/tenant-windows';
import { currentUser, hideFromTenants, requireRole } from '../auth/guards';
import { idempotencyKeyOf } from '../http/idempotency-key';
import type { WindowFilter } from '../queries/windows/window-rows';
import { tenantWindowView, tenantWindowViews } from '../services/notices/tenant-window-views';
import { assessWindow } from '../services/windows/assess-window';
import { namedConflictsOf } from '../services/windows/conflicts';
import { bookWindowOnce } from '../services/windows/book-once';
import { editWindow } from '../services/windows/edit-window';
import { ImpactNotFoundError, WindowNotFoundError } from '../services/windows/errors';
import { transitionWindow } from '../services/windows/transition-window';
import { loadWindow, windowView, windowViews } from '../services/windows/window-view';
import { storedImpact } from '../services/windows/stored-impact';
import { COMPRESS_THRESHOLD_BYTES } from '../http/compress-api';
import type { RouteDeps } from './deps';
import { windowHistoryRouter } from './windows/history';
import { windowMopRouter } from './windows/mop';
import { windowNoticesRouter } from './windows/notices';
import { windowPackRouter } from './windows/pack';
import { windowPlansRouter } from './windows/plans';
import { windowSubmitRouter } from './windows/submit';

const anyRole = requireRole(...WINDOW_READER_ROLES);
const booking = requireRole(...WINDOW_BOOKER_ROLES);
const idOf = (req: Request) => String(req.params.id);
/** Impact and conflicts name sites, spans, paths and other windows: for a tenant user the window is not found. */
const staffOnly = hideFromTenants((req) => new WindowNotFoundError(idOf(req)));

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

/** A tenant user's list: tenant views of the work it was notified of (services/notices/tenant-window-views.ts). */
function tenantList(req: Request) {
  const q = windowListQuerySchema.parse(req.query);
  return { from: new Date(q.from), to: new Date(q.to), mine: q.mine === 'true', element: q.element, tenant: q.tenant };
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
    const tenant = scope(req);
    if (tenant !== null) {
      res.json(tenantWindowListSchema.parse({ windows: await tenantWindowViews(db, tenant, tenantList(req)) }));
      return;
    }
    res.json(windowListSchema.parse({ windows: await windowViews(db, listFilter(req)) }));
  });
  // With an Idempotency-Key a repeat of the same booking answers 200 with the first request's window.
  router.post('/', booking, async (req, res) => {
    const { id, created } = await bookWindowOnce(db, windowCreateSchema.parse(req.body), currentUser(req), now(), idempotencyKeyOf(req));
    res.status(created ? 201 : 200).json(await mutation(id, false));
  });
  router.get('/:id', anyRole, async (req, res) => {
    const tenant = scope(req);
    if (tenant !== null) {
      res.json(tenantWindowViewSchema.parse(await tenantWindowView(db, tenant, idOf(req))));
      return;
    }
    res.json(windowSchema.parse(await windowView(db, idOf(req), null)));
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
    res.json(await assessWindow(db, idOf(req), { version, user: currentUser(req), now: now() }));
  });
  router.get('/:id/impact', staffOnly, anyRole, async (req, res) => {
    await loadWindow(db, idOf(req), null);
    const impact = await storedImpact(db, idOf(req));
    if (impact === null) throw new ImpactNotFoundError();
    // Sent compressed from the kept copy when the client takes it (the compression middleware leaves encoded answers be).
    res.vary('Accept-Encoding').type('application/json');
    const coding = impact.json.length >= COMPRESS_THRESHOLD_BYTES ? req.acceptsEncodings('br', 'gzip') : false;
    if (coding === 'br' || coding === 'gzip') res.setHeader('Content-Encoding', coding).send(impact.encoded(coding));
    else res.send(impact.json);
  });
  router.get('/:id/conflicts', staffOnly, anyRole, async (req, res) => {
    const w = await loadWindow(db, idOf(req), null);
    const conflicts = await namedConflictsOf(db, w);
    res.json(windowConflictsSchema.parse({ windowId: w.id, conflicts }));
  });
  // Each sub-resource router holds full '/:id/...' paths, so none shadows another or the routes above.
  router.use(windowMopRouter(deps));
  router.use(windowHistoryRouter(deps));
  router.use(windowSubmitRouter(deps));
  router.use(windowPlansRouter(deps));
  router.use(windowNoticesRouter(deps));
  router.use(windowPackRouter(deps));
  return router;
}
