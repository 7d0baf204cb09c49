// GET /api/me: the signed-in user.
import express, { type Router } from 'express';
import { meSchema } from '../../shared/api';
import { requireAuth } from '../auth/guards';
import { toPublicSession } from '../auth/sessions';

export function meRouter(): Router {
  const router = express.Router();
  router.get('/', requireAuth, (req, res) => {
    res.json(meSchema.parse(toPublicSession({ user: req.user! }).user));
  });
  return router;
}
