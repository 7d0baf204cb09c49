// GET /api/health: liveness. 200 {"ok":true} whenever the process answers HTTP; it asks nothing of the database,
// so a database outage never gets a healthy process restarted. Whether it can serve is /api/ready's question.
import express, { type Router } from 'express';
import { healthSchema } from '../../shared/api';

export function healthRouter(): Router {
  const router = express.Router();
  router.get('/', (_req, res) => {
    res.json(healthSchema.parse({ ok: true }));
  });
  return router;
}
