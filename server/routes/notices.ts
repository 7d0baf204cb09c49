// /api/notices/:id: a tenant notice, its .ics and its acknowledgement (the tenant's own; another tenant's notice
// answers 404 like a missing one), a resend after a failure and an admin's lead-time override. A window's
// notices are under /api/windows/:id/notices (routes/windows/notices.ts), upcoming work under /api/portal.
import express, { type Request, type Router } from 'express';
import { noticeOverrideSchema, noticeResponseSchema } from '../../shared/notices';
import { ADMIN_ROLES, NOTICE_READER_ROLES, NOTICE_RESENDER_ROLES, TENANT_PORTAL_ROLES, tenantScopeOf } from '../../shared/permissions';
import { currentUser, requireRole } from '../auth/guards';
import { acknowledgeNotice, overrideNotice, resendNotice } from '../services/notices/notice-actions';
import { findVisibleNotice, noticeView } from '../services/notices/notice-views';
import type { RouteDeps } from './deps';

const reader = requireRole(...NOTICE_READER_ROLES);
const idOf = (req: Request) => String(req.params.id);
/** The tenant a portal request speaks for (a tenant user without one sees nothing). */
const ownTenant = (req: Request) => currentUser(req).tenantId ?? '';

export function noticesRouter({ db, config, now, jobs }: RouteDeps): Router {
  const router = express.Router();
  const deps = () => ({ jobs, config, now: now() });

  router.post('/:id/resend', requireRole(...NOTICE_RESENDER_ROLES), async (req, res) => {
    await resendNotice(db, deps(), idOf(req), currentUser(req).id);
    res.json(noticeResponseSchema.parse({ notice: await noticeView(db, idOf(req), null) }));
  });
  router.post('/:id/override', requireRole(...ADMIN_ROLES), async (req, res) => {
    const { reason } = noticeOverrideSchema.parse(req.body);
    await overrideNotice(db, deps(), idOf(req), reason, currentUser(req).id);
    res.json(noticeResponseSchema.parse({ notice: await noticeView(db, idOf(req), null) }));
  });
  router.get('/:id', reader, async (req, res) => {
    res.json(noticeResponseSchema.parse({ notice: await noticeView(db, idOf(req), tenantScopeOf(currentUser(req))) }));
  });
  router.post('/:id/acknowledge', requireRole(...TENANT_PORTAL_ROLES), async (req, res) => {
    await acknowledgeNotice(db, idOf(req), { id: currentUser(req).id, tenantId: ownTenant(req) }, now());
    res.json(noticeResponseSchema.parse({ notice: await noticeView(db, idOf(req), ownTenant(req)) }));
  });
  router.get('/:id/ics', reader, async (req, res) => {
    const row = await findVisibleNotice(db, idOf(req), tenantScopeOf(currentUser(req)));
    res.setHeader('Content-Type', 'text/calendar; charset=utf-8; method=' + row.method);
    res.setHeader('Content-Disposition', `attachment; filename="maintenance-${row.windowId.replace(/[^\w.-]/g, '_')}.ics"`);
    res.send(row.ics);
  });
  return router;
}
