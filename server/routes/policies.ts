// /api/policies: operator staff read the booking and notice policies; admins change them (audited).
import express, { type Router } from 'express';
import { ADMIN_ROLES, OPERATOR_ROLES } from '../../shared/permissions';
import { policiesPatchSchema, policiesResponseSchema } from '../../shared/policies';
import { currentUser, requireRole } from '../auth/guards';
import { insertAuditEntry } from '../queries/audit/audit-log';
import { getPolicies, lockPolicies, upsertPolicies } from '../queries/windows/policies';
import { QuorumOrderError } from '../services/signoff/errors';
import type { RouteDeps } from './deps';

export function policiesRouter({ db, now }: RouteDeps): Router {
  const router = express.Router();
  router.get('/', requireRole(...OPERATOR_ROLES), async (_req, res) => {
    res.json(policiesResponseSchema.parse({ policies: await getPolicies(db) }));
  });
  router.patch('/', requireRole(...ADMIN_ROLES), async (req, res) => {
    const patch = policiesPatchSchema.parse(req.body);
    const at = now();
    const policies = await db.transaction(async (tx) => {
      await lockPolicies(tx);
      const before = await getPolicies(tx);
      // Checked on the merged values: a patch may change only one of the two quorums.
      const low = patch.signoffQuorumLow ?? before.signoffQuorumLow;
      const high = patch.signoffQuorumHigh ?? before.signoffQuorumHigh;
      if (high < low) throw new QuorumOrderError(low, high);
      await upsertPolicies(tx, patch, currentUser(req).id, at);
      const after = await getPolicies(tx);
      await insertAuditEntry(tx, { actorId: currentUser(req).id, action: 'policy.update', entity: 'policy', at, before, after });
      return after;
    });
    res.json(policiesResponseSchema.parse({ policies }));
  });
  return router;
}
