// People (admin): GET /api/users (search and filter), PUT /api/users/:id/roles, POST /api/users/:id/deactivate and
// /reactivate. Invitations are in routes/invitations.ts.
import express, { type Router } from 'express';
import { z } from 'zod';
import { peopleFilterSchema, peopleListSchema, personSchema, roleAssignmentSchema } from '../../shared/people';
import { ADMIN_ROLES } from '../../shared/permissions';
import { currentUser, requireRole } from '../auth/guards';
import { deactivatePerson, findPeople, reactivatePerson, setRoles } from '../services/people/manage-people';
import type { RouteDeps } from './deps';

const idSchema = z.string().min(1).max(200);

export function usersRouter({ db, now }: RouteDeps): Router {
  const router = express.Router();
  router.use(requireRole(...ADMIN_ROLES));

  router.get('/', async (req, res) => {
    const filter = peopleFilterSchema.parse(req.query);
    res.json(peopleListSchema.parse({ users: await findPeople({ db, now: now() }, filter) }));
  });

  router.put('/:id/roles', async (req, res) => {
    const assignment = roleAssignmentSchema.parse(req.body);
    res.json(personSchema.parse(await setRoles({ db, now: now() }, currentUser(req), idSchema.parse(req.params.id), assignment)));
  });

  router.post('/:id/deactivate', async (req, res) => {
    res.json(personSchema.parse(await deactivatePerson({ db, now: now() }, currentUser(req), idSchema.parse(req.params.id))));
  });

  router.post('/:id/reactivate', async (req, res) => {
    res.json(personSchema.parse(await reactivatePerson({ db, now: now() }, currentUser(req), idSchema.parse(req.params.id))));
  });

  return router;
}
