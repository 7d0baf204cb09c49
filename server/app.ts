// createApp(): the Express application, without a port, so tests drive it directly.
import cookieParser from 'cookie-parser';
import express from 'express';
import type pg from 'pg';
import type { Db } from '../db/client';
import './auth/request-auth';
import { sessionMiddleware } from './auth/session-middleware';
import type { SignInLimit } from './auth/sign-in-limit';
import type { ServerConfig } from './env';
import { RouteNotFoundError } from './errors';
import { noJobQueue, type JobQueue } from './jobs/queue';
import { compressAnswers } from './http/compress-api';
import { errorHandler, type ErrorLog } from './http/error-handler';
import { inputHygiene } from './http/input-hygiene';
import { originCheck } from './http/origin-check';
import { requestLog } from './http/request-log';
import { securityHeaders } from './http/security-headers';
import { webApp } from './http/web-app';
import { silentLogger, type Logger } from './log/logger';
import { httpMetrics } from './metrics/http-metrics';
import { metricsEndpoint } from './metrics/metrics-route';
import { authRouter } from './routes/auth';
import { calendarFeedsRouter } from './routes/calendar-feeds';
import { healthRouter } from './routes/health';
import { readyRouter } from './routes/ready';
import { importsRouter } from './routes/imports';
import { meRouter } from './routes/me';
import { overviewRouter } from './routes/overview';
import { scenariosRouter } from './routes/scenarios';
import { usersRouter } from './routes/users';
import { windowsRouter } from './routes/windows';
import { freezesRouter } from './routes/freezes';
import { policiesRouter } from './routes/policies';
import { exportRouter } from './routes/export';
import { networkRouter } from './routes/network';
import { sitesRouter } from './routes/sites';
import { slicesRouter } from './routes/slices';
import { spansRouter } from './routes/spans';
import { tenantsRouter } from './routes/tenants';
import { outboxRouter } from './routes/outbox';
import { noticesRouter } from './routes/notices';
import { signoffRouter } from './routes/signoff';
import { plansRouter } from './routes/plans';
import { portalRouter } from './routes/portal';
import { setUpRouter } from './routes/set-up';
import { demoDataRouter } from './routes/demo-data';
import { ssoSignInRouter } from './routes/auth/sso';
import { ssoSettingsRouter } from './routes/sso';
import { invitationsRouter } from './routes/invitations';
import { auditRouter } from './routes/audit';
import { slotSearchesRouter } from './routes/slot-searches';
import { campaignsRouter } from './routes/campaigns';
import type { SlotEngine } from './services/campaigns/engine';

export type AppDeps = {
  db: Db;
  /** Owned by the caller (server/index.ts closes it); accepted here so callers pass one bundle. */
  pool?: pg.Pool;
  config: ServerConfig;
  now?: () => Date;
  /** plan runs and mail; default: none (routes that enqueue answer 503) */
  jobs?: JobQueue;
  signInLimit?: SignInLimit;
  /** request lines and each request's child logger (req.log); default: a logger that writes nothing */
  logger?: Logger;
  /** the slot finder and campaign scheduler the slot-search and campaign routes check with; default the real ones */
  slotEngine?: SlotEngine;
  /** where an unexpected (500) error is reported; default: the request's logger at `error`, safe fields only */
  log?: ErrorLog;
};

// API answers depend on who asks and when; no shared cache may keep them.
const noStore: express.RequestHandler = (_req, res, next) => {
  res.setHeader('Cache-Control', 'no-store');
  next();
};

function apiRouter(
  deps: Required<Pick<AppDeps, 'db' | 'config' | 'now' | 'signInLimit' | 'jobs'>> & Pick<AppDeps, 'slotEngine'>,
): express.Router {
  const api = express.Router();
  api.use(noStore);
  api.use('/auth/sso', ssoSignInRouter(deps));
  api.use('/auth', authRouter(deps));
  api.use('/set-up', setUpRouter(deps));
  api.use('/sso', ssoSettingsRouter(deps));
  api.use('/demo-data', demoDataRouter(deps));
  api.use('/me', meRouter(deps));
  api.use('/overview', overviewRouter(deps));
  api.use('/users', usersRouter(deps));
  api.use('/invitations', invitationsRouter(deps));
  api.use('/scenarios', scenariosRouter());
  api.use('/windows', windowsRouter(deps));
  api.use('/signoff', signoffRouter(deps));
  api.use('/freezes', freezesRouter(deps));
  api.use('/policies', policiesRouter(deps));
  api.use('/imports', importsRouter(deps));
  api.use('/sites', sitesRouter(deps));
  api.use('/spans', spansRouter(deps));
  api.use('/tenants', tenantsRouter(deps));
  api.use('/slices', slicesRouter(deps));
  api.use('/network', networkRouter(deps));
  api.use('/export', exportRouter(deps));
  api.use('/outbox', outboxRouter(deps));
  api.use('/plans', plansRouter(deps));
  api.use('/notices', noticesRouter(deps));
  api.use('/portal', portalRouter(deps));
  api.use('/audit', auditRouter(deps));
  api.use('/slot-searches', slotSearchesRouter({ ...deps, engine: deps.slotEngine }));
  api.use('/campaigns', campaignsRouter({ ...deps, engine: deps.slotEngine }));
  api.use((req, _res, next) => next(new RouteNotFoundError(req.method, req.originalUrl.split('?')[0])));
  return api;
}

export function createApp(deps: AppDeps): express.Application {
  const { db, config } = deps;
  const now = deps.now ?? (() => new Date());
  const signInLimit = deps.signInLimit ?? config.signInLimit;
  const app = express();
  app.disable('x-powered-by');
  // Off by default: only the proxies TRUST_PROXY names may set the client's address (sign-in limits, sessions).
  app.set('trust proxy', config.trustProxy);
  // First: every request gets its id (X-Request-Id) and its one log line, whatever answers it.
  app.use(requestLog(deps.logger ?? silentLogger()));
  app.use(httpMetrics());
  app.use(securityHeaders());
  // br or gzip for answers of 1 KB and more; the web app's precompressed copies already carry Content-Encoding and pass through.
  app.use(compressAnswers());
  // Prometheus scrapes: no session, no body; METRICS_ACCESS decides who may read (metrics/metrics-route.ts).
  app.get('/metrics', metricsEndpoint({ db, pool: deps.pool, config }));
  // Before sessions and body parsing: probes carry no cookie, and liveness must not wait on the database.
  app.use('/api/health', noStore, healthRouter());
  app.use('/api/ready', noStore, readyRouter({ db, jobs: deps.jobs ?? noJobQueue }));
  // Calendar apps fetch feeds without a cookie: the token in the address is the credential (routes/calendar-feeds.ts).
  app.use('/api/calendar-feeds', calendarFeedsRouter({ db, config, now }));
  app.use(express.json({ limit: config.jsonBodyLimit }));
  app.use(cookieParser());
  // After body parsing, before any router: NUL, lone surrogates and broken percent-encoding never reach a handler.
  app.use(inputHygiene());
  app.use(originCheck({ allowedOrigins: config.allowedOrigins }));
  // Only the API needs to know who is asking; static files skip the session look-up.
  app.use('/api', sessionMiddleware({ db, config, now }), apiRouter({
    db, config, now, signInLimit, jobs: deps.jobs ?? noJobQueue, slotEngine: deps.slotEngine,
  }));
  app.use(webApp({ webDist: config.webDist }));
  app.use((req, _res, next) => next(new RouteNotFoundError(req.method, req.path)));
  app.use(errorHandler({ log: deps.log ?? ((message, err, req) => req.log.error({ err }, message)) }));
  return app;
}
