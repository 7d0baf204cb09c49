// Tenant notices. Staff: a window's notices with their sending state, resend after a failure, an admin's
// lead-time override. Tenant portal: upcoming work, a notice, its acknowledgement and its .ics; another
// tenant's notice answers 404 like a missing one. Mounted at /api (paths span windows, notices and portal).
import express, { type Request, type Router } from 'express';
import { noticeOverrideSchema, noticeResponseSchema, portalWorkSchema, windowNoticesSchema } from '../../shared/notices';
import { requireRole } from '../auth/guards';
import { acknowledgeNotice, overrideNotice, resendNotice } from '../services/notices/notice-actions';
import { findVisibleNotice, noticeView, portalWork, windowNoticeRows } from '../services/notices/notice-views';
import { loadWindow } from '../services/windows/window-view';
import { STAFF_ROLES, tenantScopeOf } from '../services/windows/tenant-scope';
import type { RouteDeps } from './deps';

const staff = requireRole('admin', 'planner', 'approver');
const reader = requireRole(...STAFF_ROLES, 'tenant');
const tenantOnly = requireRole('tenant');
const idOf = (req: Request) => String(req.params.id);
/** The tenant a portal request speaks for (a tenant user without one sees nothing). */
const ownTenant = (req: Request) => req.user!.tenantId ?? '';

export function noticesRouter({ db, config, now, jobs }: RouteDeps): Router {
  const router = express.Router();
  const deps = () => ({ jobs, config, now: now() });

  router.get('/windows/:id/notices', staff, async (req, res) => {
    await loadWindow(db, idOf(req), null);
    res.json(windowNoticesSchema.parse({ windowId: idOf(req), notices: await windowNoticeRows(db, idOf(req)) }));
  });
  router.post('/notices/:id/resend', requireRole('admin', 'planner'), async (req, res) => {
    await resendNotice(db, deps(), idOf(req), req.user!.id);
    res.json(noticeResponseSchema.parse({ notice: await noticeView(db, idOf(req), null) }));
  });
  router.post('/notices/:id/override', requireRole('admin'), async (req, res) => {
    const { reason } = noticeOverrideSchema.parse(req.body);
    await overrideNotice(db, deps(), idOf(req), reason, req.user!.id);
    res.json(noticeResponseSchema.parse({ notice: await noticeView(db, idOf(req), null) }));
  });
  router.get('/portal/work', tenantOnly, async (req, res) => {
    res.json(portalWorkSchema.parse(await portalWork(db, ownTenant(req), now())));
  });
  router.get('/notices/:id', reader, async (req, res) => {
    res.json(noticeResponseSchema.parse({ notice: await noticeView(db, idOf(req), tenantScopeOf(req.user!)) }));
  });
  router.post('/notices/:id/acknowledge', tenantOnly, async (req, res) => {
    await acknowledgeNotice(db, idOf(req), { id: req.user!.id, tenantId: ownTenant(req) }, now());
    res.json(noticeResponseSchema.parse({ notice: await noticeView(db, idOf(req), ownTenant(req)) }));
  });
  router.get('/notices/:id/ics', reader, async (req, res) => {
    const row = await findVisibleNotice(db, idOf(req), tenantScopeOf(req.user!));
    res.setHeader('Content-Type', 'text/calendar; charset=utf-8; method=' + row.method);
    res.setHeader('Content-Disposition', `attachment; filename="maintenance-${row.windowId.replace(/[^\w.-]/g, '_')}.ics"`);
    res.send(row.ics);
  });
  return router;
}
