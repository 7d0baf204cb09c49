// /api/freezes: periods in which no window may be booked. Operator staff read, admins write.
import express, { type Request, type Router } from 'express';
import { z } from 'zod';
import { freezeCreateSchema, freezeListSchema, freezePatchSchema, freezeSchema } from '../../shared/freezes';
import { ADMIN_ROLES, OPERATOR_ROLES } from '../../shared/permissions';
import { currentUser, requireRole } from '../auth/guards';
import { listFreezes } from '../queries/windows/freezes';
import { createFreeze, patchFreeze, removeFreeze, toFreeze } from '../services/windows/freezes';
import type { RouteDeps } from './deps';

const rangeSchema = z.object({
  from: z.iso.datetime({ offset: true }).optional(),
  to: z.iso.datetime({ offset: true }).optional(),
});
const idOf = (req: Request) => String(req.params.id);

export function freezesRouter({ db, now }: RouteDeps): Router {
  const router = express.Router();
  const admin = requireRole(...ADMIN_ROLES);
  router.get('/', requireRole(...OPERATOR_ROLES), async (req, res) => {
    const q = rangeSchema.parse(req.query);
    const rows = await listFreezes(db, { from: q.from ? new Date(q.from) : undefined, to: q.to ? new Date(q.to) : undefined });
    res.json(freezeListSchema.parse({ freezes: rows.map(toFreeze) }));
  });
  router.post('/', admin, async (req, res) => {
    res.status(201).json(freezeSchema.parse(await createFreeze(db, freezeCreateSchema.parse(req.body), currentUser(req), now())));
  });
  router.patch('/:id', admin, async (req, res) => {
    res.json(freezeSchema.parse(await patchFreeze(db, idOf(req), freezePatchSchema.parse(req.body), currentUser(req), now())));
  });
  router.delete('/:id', admin, async (req, res) => {
    await removeFreeze(db, idOf(req), currentUser(req), now());
    res.status(204).end();
  });
  return router;
}
