// GET /api/audit (the audit trail, a page of entries or, with format=csv, every filtered entry as CSV) and
// GET /api/audit/choices (what its filters offer): admins and approvers. Tenant users get 404 (the trail does not
// exist for them); engineers and planners 403. Read only: no route here changes an audit row.
import express, { type Router } from 'express';
import { auditChoicesSchema, auditPageSchema, auditQuerySchema } from '../../shared/audit';
import { AUDIT_READER_ROLES } from '../../shared/permissions';
import { NETWORK_TIME_ZONE } from '../../shared/time-zone';
import { currentUser, staffOnlyRoute } from '../auth/guards';
import { auditChoices, auditCsv, auditPage } from '../services/audit/audit-trail';
import type { RouteDeps } from './deps';

export function auditRouter({ db, now }: RouteDeps): Router {
  const router = express.Router();
  router.use(...staffOnlyRoute(...AUDIT_READER_ROLES));

  router.get('/', async (req, res) => {
    const query = auditQuerySchema.parse(req.query);
    const timeZone = currentUser(req).timeZone ?? NETWORK_TIME_ZONE;
    if (query.format === 'csv') {
      const csv = await auditCsv(db, query, timeZone);
      res.setHeader('Content-Type', 'text/csv; charset=utf-8');
      res.setHeader('Content-Disposition', `attachment; filename="audit-trail-${now().toISOString().slice(0, 10)}.csv"`);
      res.send(csv);
      return;
    }
    res.json(auditPageSchema.parse(await auditPage(db, query, timeZone)));
  });

  router.get('/choices', async (_req, res) => {
    res.json(auditChoicesSchema.parse(await auditChoices(db)));
  });

  return router;
}
