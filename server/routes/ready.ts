// GET /api/ready: readiness for a load balancer or orchestrator. 200 when this process can serve (the database
// answers a query within a short time, the job queue runs, every committed migration is applied); else 503 with
// each check's state and one line per problem. No session: probes carry no cookie.
import express, { type Router } from 'express';
import { readCommittedMigrations } from '../../db/migrate';
import { readinessSchema } from '../../shared/readiness';
import { selectAppliedMigrations } from '../queries/health/applied-migrations';
import { selectOne } from '../queries/health/ping-database';
import { checkReadiness } from '../services/readiness/check-readiness';
import type { RouteDeps } from './deps';

/** A probe's own timeout is typically 1–5 s; the answer comes before it. */
const READY_TIMEOUT_MS = 2000;

export function readyRouter({ db, jobs }: Pick<RouteDeps, 'db' | 'jobs'>): Router {
  const router = express.Router();
  // Read once: the committed migrations are part of this build.
  const committedMigrations = readCommittedMigrations();
  router.get('/', async (_req, res) => {
    const readiness = await checkReadiness({
      query: () => selectOne(db),
      appliedMigrations: () => selectAppliedMigrations(db),
      committedMigrations,
      jobQueueRunning: () => jobs.isRunning?.() ?? false,
      timeoutMs: READY_TIMEOUT_MS,
    });
    res.status(readiness.ready ? 200 : 503).json(readinessSchema.parse(readiness));
  });
  return router;
}
