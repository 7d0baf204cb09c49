// GET /api/users (admin): every user with its roles.
import express, { type Router } from 'express';
import { userListSchema } from '../../shared/api';
import { ADMIN_ROLES } from '../../shared/permissions';
import { requireRole } from '../auth/guards';
import { listUsersWithRoles } from '../queries/auth/users';
import type { RouteDeps } from './deps';

export function usersRouter({ db }: RouteDeps): Router {
  const router = express.Router();
  router.get('/', requireRole(...ADMIN_ROLES), async (_req, res) => {
    res.json(userListSchema.parse({ users: await listUsersWithRoles(db) }));
  });
  return router;
}
