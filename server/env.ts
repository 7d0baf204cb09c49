// Server configuration, parsed from the environment with zod once at boot.
import { z } from 'zod';
import { DEFAULT_WAITING_JOB_LIMITS, type WaitingJobLimits } from '../shared/job-limits';

const DAY_SECONDS = 24 * 60 * 60;

const envSchema = z.object({
  PORT: z.coerce.number().int().min(1).max(65535).default(8080),
  HOST: z.string().min(1).default('127.0.0.1'),
  DATABASE_URL: z.string({ error: 'DATABASE_URL is required (postgres://user@host:port/database)' })
    .regex(/^postgres(ql)?:\/\//, 'DATABASE_URL must start with postgres:// or postgresql://'),
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  SESSION_INACTIVITY_SECONDS: z.coerce.number().int().min(60).default(7 * DAY_SECONDS),
  /** Absolute session lifetime in days from sign-in: the session ends then even while in use. */
  SESSION_MAX_DAYS: z.coerce.number().int().min(1).max(365).default(30),
  WEB_DIST: z.string().min(1).default('dist'),
  /** `auto`: Secure cookies except when the request's host is loopback (local http use). */
  COOKIE_SECURE: z.enum(['auto', 'always', 'never']).default('auto'),
  /** Extra origins allowed to make state-changing requests (comma-separated), e.g. the Metro dev server. */
  ALLOWED_ORIGINS: z.string().default(''),
  JSON_BODY_LIMIT: z.string().regex(/^\d+(b|kb|mb)$/i, 'JSON_BODY_LIMIT looks like 2mb or 500kb').default('2mb'),
  SIGN_IN_LIMIT_WINDOW_MS: z.coerce.number().int().min(1000).default(15 * 60 * 1000),
  /** Failed sign-ins per e-mail address in the window (OWASP's Authentication Cheat Sheet: lock out after a few). */
  SIGN_IN_LIMIT_PER_ACCOUNT: z.coerce.number().int().min(1).default(5),
  /** Failed sign-ins per client address in the window: more than one account's share (offices behind one NAT). */
  SIGN_IN_LIMIT_PER_ADDRESS: z.coerce.number().int().min(1).default(20),
  /** Largest file POST /api/imports accepts, in bytes (default 5 MB). */
  IMPORT_MAX_BYTES: z.coerce.number().int().min(1024).default(5 * 1024 * 1024),
  /** `true`: the API process also works the job queue (plan runs, mail); `false`: only `npm run worker` does. */
  WORKER_IN_PROCESS: z.enum(['true', 'false']).default('true'),
  /** How long past its time limit a plan run may hold its job before the queue assumes the worker died. */
  PLAN_EXPIRE_MARGIN_SECONDS: z.coerce.number().int().min(1).default(120),
  /** A running plan whose worker has not written a heartbeat for this long is handed to another worker. */
  PLAN_HEARTBEAT_STALE_SECONDS: z.coerce.number().int().min(5).default(30),
  /** Unfinished (queued or running) slot searches, campaign plans and move-plan runs one person may have; one more
   *  is refused with 429 (defaults and why: shared/job-limits.ts). */
  WAITING_SLOT_SEARCHES_PER_PERSON: z.coerce.number().int().min(1).default(DEFAULT_WAITING_JOB_LIMITS.slotSearches),
  WAITING_CAMPAIGN_PLANS_PER_PERSON: z.coerce.number().int().min(1).default(DEFAULT_WAITING_JOB_LIMITS.campaignPlans),
  WAITING_PLAN_RUNS_PER_PERSON: z.coerce.number().int().min(1).default(DEFAULT_WAITING_JOB_LIMITS.planRuns),
  /** How often the queue looks for expired jobs (pg-boss maintenance), in seconds. */
  JOB_MAINTENANCE_SECONDS: z.coerce.number().int().min(1).default(30),
  /** PostgreSQL schema of the job queue's tables; every API process and worker sharing a queue uses the same one. */
  JOB_SCHEMA: z.string().regex(/^[a-z_][a-z0-9_]{0,49}$/, 'JOB_SCHEMA is a lower-case PostgreSQL identifier').default('pgboss'),
  /** `sink` (default): mail goes to the local SMTP sink started with the server; or an smtp:// / smtps:// URL. */
  SMTP_URL: z.string().regex(/^(sink|smtps?:\/\/.+)$/, 'SMTP_URL is `sink` or an smtp:// or smtps:// URL').default('sink'),
  /** Loopback port of the local SMTP sink (0 = any free port). */
  SMTP_SINK_PORT: z.coerce.number().int().min(0).max(65535).default(2525),
  MAIL_FROM: z.string().min(3).default('Slackwater <maintenance@slackwater.invalid>'),
  /** Where links in e-mails point (the app's address as users reach it). */
  PUBLIC_URL: z.url().optional(),
  /** Least severe log level written (pino's levels; `silent` writes nothing). */
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  /** `auto`: readable lines when standard output is a terminal, one JSON object per line otherwise. */
  LOG_FORMAT: z.enum(['auto', 'json', 'pretty']).default('auto'),
  /** On SIGTERM/SIGINT, how long requests in progress and a running plan job get to finish before the process exits. */
  SHUTDOWN_GRACE_SECONDS: z.coerce.number().int().min(1).max(300).default(10),
  /** Which proxies in front may speak for the client (X-Forwarded-For, -Proto, -Host): `off`, `loopback`, a hop
   *  count, or comma-separated addresses / CIDR ranges (Express's `trust proxy`). */
  TRUST_PROXY: z.string().trim()
    .regex(/^(off|loopback|\d{1,2}|[0-9a-fA-F:.]+(\/\d{1,3})?(\s*,\s*[0-9a-fA-F:.]+(\/\d{1,3})?)*)$/,
      'TRUST_PROXY is off, loopback, a hop count or comma-separated proxy addresses / CIDR ranges')
    .default('off'),
  /** Who may read /metrics: `loopback` (this machine, not through a proxy), `token` (Bearer METRICS_TOKEN) or `open`.
   *  Default: `token` when METRICS_TOKEN is set, else `loopback`. */
  METRICS_ACCESS: z.enum(['loopback', 'token', 'open']).optional(),
  /** The bearer token a scraper sends to /metrics; at least 32 characters (e.g. `openssl rand -hex 32`). */
  METRICS_TOKEN: z.string().min(32, 'METRICS_TOKEN is at least 32 characters (e.g. openssl rand -hex 32)').optional(),
});

export type ServerConfig = {
  port: number;
  host: string;
  databaseUrl: string;
  nodeEnv: 'development' | 'production' | 'test';
  sessionInactivitySeconds: number;
  sessionMaxAgeSeconds: number;
  webDist: string;
  cookieSecure: 'auto' | 'always' | 'never';
  allowedOrigins: string[];
  jsonBodyLimit: string;
  signInLimit: { windowMs: number; perAccount: number; perAddress: number };
  importMaxBytes: number;
  workerInProcess: boolean;
  planExpireMarginSeconds: number;
  planHeartbeatStaleSeconds: number;
  waitingJobLimits: WaitingJobLimits;
  jobMaintenanceSeconds: number;
  jobSchema: string;
  smtp: { mode: 'sink'; sinkPort: number } | { mode: 'relay'; url: string };
  mailFrom: string;
  publicUrl: string;
  log: { level: 'fatal' | 'error' | 'warn' | 'info' | 'debug' | 'trace' | 'silent'; format: 'auto' | 'json' | 'pretty' };
  shutdownGraceSeconds: number;
  metrics: { mode: 'loopback' | 'token' | 'open'; token: string | null };
  /** Express's `trust proxy`: false, a hop count, or `loopback` / addresses. */
  trustProxy: false | number | string;
};

export class ConfigError extends Error {}

/** Parses `source` (default `process.env`); throws a ConfigError naming every bad variable. */
export function parseEnv(source: Record<string, string | undefined> = process.env): ServerConfig {
  const parsed = envSchema.safeParse(source);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((issue) => `  ${issue.path.join('.') || '(env)'}: ${issue.message}`);
    throw new ConfigError(`Invalid server configuration:\n${lines.join('\n')}`);
  }
  const env = parsed.data;
  if (env.METRICS_ACCESS === 'token' && !env.METRICS_TOKEN) {
    throw new ConfigError('Invalid server configuration:\n  METRICS_TOKEN: required when METRICS_ACCESS=token');
  }
  return {
    port: env.PORT,
    host: env.HOST,
    databaseUrl: env.DATABASE_URL,
    nodeEnv: env.NODE_ENV,
    sessionInactivitySeconds: env.SESSION_INACTIVITY_SECONDS,
    sessionMaxAgeSeconds: env.SESSION_MAX_DAYS * DAY_SECONDS,
    webDist: env.WEB_DIST,
    cookieSecure: env.COOKIE_SECURE,
    allowedOrigins: env.ALLOWED_ORIGINS.split(',').map((o) => o.trim()).filter(Boolean),
    jsonBodyLimit: env.JSON_BODY_LIMIT,
    signInLimit: {
      windowMs: env.SIGN_IN_LIMIT_WINDOW_MS, perAccount: env.SIGN_IN_LIMIT_PER_ACCOUNT, perAddress: env.SIGN_IN_LIMIT_PER_ADDRESS,
    },
    importMaxBytes: env.IMPORT_MAX_BYTES,
    workerInProcess: env.WORKER_IN_PROCESS === 'true',
    planExpireMarginSeconds: env.PLAN_EXPIRE_MARGIN_SECONDS,
    planHeartbeatStaleSeconds: env.PLAN_HEARTBEAT_STALE_SECONDS,
    waitingJobLimits: {
      slotSearches: env.WAITING_SLOT_SEARCHES_PER_PERSON,
      campaignPlans: env.WAITING_CAMPAIGN_PLANS_PER_PERSON,
      planRuns: env.WAITING_PLAN_RUNS_PER_PERSON,
    },
    jobMaintenanceSeconds: env.JOB_MAINTENANCE_SECONDS,
    jobSchema: env.JOB_SCHEMA,
    smtp: env.SMTP_URL === 'sink' ? { mode: 'sink', sinkPort: env.SMTP_SINK_PORT } : { mode: 'relay', url: env.SMTP_URL },
    mailFrom: env.MAIL_FROM,
    publicUrl: (env.PUBLIC_URL ?? `http://${env.HOST}:${env.PORT}`).replace(/\/$/, ''),
    log: { level: env.LOG_LEVEL, format: env.LOG_FORMAT },
    shutdownGraceSeconds: env.SHUTDOWN_GRACE_SECONDS,
    trustProxy: env.TRUST_PROXY === 'off' ? false : /^\d+$/.test(env.TRUST_PROXY) ? Number(env.TRUST_PROXY) : env.TRUST_PROXY,
    metrics: { mode: env.METRICS_ACCESS ?? (env.METRICS_TOKEN ? 'token' : 'loopback'), token: env.METRICS_TOKEN ?? null },
  };
}

/** For the entry points (server, worker): the configuration, or one message naming what is wrong and exit 1. */
export function parseEnvOrExit(): ServerConfig {
  try {
    return parseEnv();
  } catch (err) {
    if (!(err instanceof ConfigError)) throw err;
    console.error(err.message);
    process.exit(1);
  }
}
