// GET /api/users (admin): every user with its roles.
import express, { type Router } from 'express';
import { userListSchema } from '../../shared/api';
import { requireRole } from '../auth/guards';
import { listUsersWithRoles } from '../queries/users';
import type { RouteDeps } from './deps';

export function usersRouter({ db }: RouteDeps): Router {
  const router = express.Router();
  router.get('/', requireRole('admin'), async (_req, res) => {
    res.json(userListSchema.parse({ users: await listUsersWithRoles(db) }));
  });
  return router;
}
