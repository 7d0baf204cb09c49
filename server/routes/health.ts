// GET /api/health: 200 {"ok":true,"db":true}, or 503 {"ok":false,"db":false} when the database does not answer.
import express, { type Router } from 'express';
import { healthSchema } from '../../shared/api';
import { pingDatabase } from '../queries/health/ping-database';
import type { RouteDeps } from './deps';

const DB_PING_TIMEOUT_MS = 2000;

export function healthRouter({ db }: RouteDeps): Router {
  const router = express.Router();
  router.get('/', async (_req, res) => {
    const dbOk = await pingDatabase(db, { timeoutMs: DB_PING_TIMEOUT_MS });
    res.status(dbOk ? 200 : 503).json(healthSchema.parse({ ok: dbOk, db: dbOk }));
  });
  return router;
}
