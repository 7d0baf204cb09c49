// /api/policies: staff read the booking and notice policies; admins change them (audited).
import express, { type Router } from 'express';
import { policiesPatchSchema, policiesResponseSchema } from '../../shared/policies';
import { requireRole } from '../auth/guards';
import { insertAuditEntry } from '../queries/audit';
import { getPolicies, upsertPolicies } from '../queries/windows/policies';
import { STAFF_ROLES } from '../services/windows/tenant-scope';
import type { RouteDeps } from './deps';

export function policiesRouter({ db, now }: RouteDeps): Router {
  const router = express.Router();
  router.get('/', requireRole(...STAFF_ROLES), async (_req, res) => {
    res.json(policiesResponseSchema.parse({ policies: await getPolicies(db) }));
  });
  router.patch('/', requireRole('admin'), async (req, res) => {
    const patch = policiesPatchSchema.parse(req.body);
    const at = now();
    const policies = await db.transaction(async (tx) => {
      const before = await getPolicies(tx);
      await upsertPolicies(tx, patch, req.user!.id, at);
      const after = await getPolicies(tx);
      await insertAuditEntry(tx, { actorId: req.user!.id, action: 'policy.update', entity: 'policy', at, before, after });
      return after;
    });
    res.json(policiesResponseSchema.parse({ policies }));
  });
  return router;
}
