// The process's Prometheus metrics (prom-client), served at /metrics (server/metrics/metrics-route.ts).
// One registry per process: the HTTP middleware, the plan worker and the mail worker count into it wherever
// they run. Names follow Prometheus conventions: base units (seconds), `_total` for counters.
import { collectDefaultMetrics, Counter, Gauge, Histogram, Registry } from 'prom-client';

export const registry = new Registry();

// Process metrics (CPU seconds, resident memory, open file descriptors, event loop lag, heap, GC), unprefixed so
// common Node.js dashboards work on them.
collectDefaultMetrics({ register: registry });

export const httpRequestDuration = new Histogram({
  name: 'slackwater_http_request_duration_seconds',
  help: 'HTTP requests by method, route pattern and status: duration in seconds (its _count is the request count).',
  labelNames: ['method', 'route', 'status'] as const,
  buckets: [0.005, 0.01, 0.025, 0.05, 0.1, 0.25, 0.5, 1, 2.5, 5, 10, 30],
  registers: [registry],
});

export const PLAN_RUN_OUTCOMES = ['done', 'failed', 'retried', 'cancelled', 'superseded'] as const;
export type PlanRunOutcome = (typeof PLAN_RUN_OUTCOMES)[number];

export const planRuns = new Counter({
  name: 'slackwater_plan_runs_total',
  help: 'Plan-run attempts worked by this process, by outcome (retried: handed back to the queue).',
  labelNames: ['outcome'] as const,
  registers: [registry],
});

export const planRunDuration = new Histogram({
  name: 'slackwater_plan_run_duration_seconds',
  help: 'Compute time of plan-run attempts in seconds, by outcome.',
  labelNames: ['outcome'] as const,
  buckets: [1, 5, 15, 30, 60, 120, 300, 600, 1800, 3600],
  registers: [registry],
});

export const mailSent = new Counter({
  name: 'slackwater_mail_sent_total',
  help: 'E-mails the mail relay accepted.',
  registers: [registry],
});

export const mailFailed = new Counter({
  name: 'slackwater_mail_failed_total',
  help: 'Failed e-mail send attempts (each is retried by the queue until its retries are used up).',
  registers: [registry],
});

export const mailGivenUp = new Counter({
  name: 'slackwater_mail_given_up_total',
  help: 'E-mails whose retries were used up without a send (their notices are marked failed).',
  registers: [registry],
});

export const jobQueueJobs = new Gauge({
  name: 'slackwater_job_queue_jobs',
  help: 'Jobs in the job queue (pg-boss) by queue and state: waiting (created or waiting to retry) or active.',
  labelNames: ['queue', 'state'] as const,
  registers: [registry],
});

export const dbPoolConnections = new Gauge({
  name: 'slackwater_db_pool_connections',
  help: "Connections of the API's database pool by state: in_use or idle.",
  labelNames: ['state'] as const,
  registers: [registry],
});

export const dbPoolWaiting = new Gauge({
  name: 'slackwater_db_pool_waiting_requests',
  help: "Queries waiting for a free connection of the API's database pool.",
  registers: [registry],
});

export const databaseReachable = new Gauge({
  name: 'slackwater_database_reachable',
  help: 'Whether the database answered the scrape\'s queue-depth query in time (1) or not (0).',
  registers: [registry],
});

/** Counts one finished plan-run attempt. */
export function observePlanRun(outcome: PlanRunOutcome, computeMs: number): void {
  planRuns.inc({ outcome });
  planRunDuration.observe({ outcome }, computeMs / 1000);
}
