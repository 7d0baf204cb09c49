// One log line per request (pino-http): request id, method, route pattern, status, duration and user id — never
// the path's values, the query, headers, cookies or the body. Each request gets a child logger (req.log) that
// carries its id, so whatever a route or service logs for it can be found with the request line.
import { randomUUID } from 'node:crypto';
import type { IncomingMessage, ServerResponse } from 'node:http';
import type { Request, RequestHandler } from 'express';
import { pinoHttp } from 'pino-http';
import type { Logger } from '../log/logger';
import { errorFields } from './error-log';
import { routePattern, trackRoutePattern } from '../metrics/route-pattern';

export const REQUEST_ID_HEADER = 'X-Request-Id';

/** An incoming id is kept when a proxy's id could look like it: a UUID, a hex or base64url token, up to 128 characters. */
const SANE_REQUEST_ID = /^[A-Za-z0-9][A-Za-z0-9._:+/=-]{0,127}$/;

/** Probes answered well are expected every few seconds; their lines are `debug` so they do not drown the rest. */
const PROBE_ROUTES = new Set(['/api/health', '/api/ready', '/metrics']);

export function requestIdOf(req: IncomingMessage): string {
  const incoming = req.headers['x-request-id'];
  return typeof incoming === 'string' && SANE_REQUEST_ID.test(incoming) ? incoming : randomUUID();
}

type Line = { method: string; route: string | null; status: number; durationMs: number; userId: string | null; aborted?: true };

function lineOf(req: IncomingMessage, res: ServerResponse, durationMs: unknown): Line {
  const r = req as Request;
  const line: Line = {
    method: req.method ?? '', route: routePattern(r), status: res.statusCode,
    durationMs: typeof durationMs === 'number' ? durationMs : 0, userId: r.user?.id ?? null,
  };
  if (!res.writableEnded) line.aborted = true;
  return line;
}

function levelOf(req: IncomingMessage, res: ServerResponse): 'error' | 'info' | 'debug' {
  if (res.statusCode >= 500) return 'error';
  if (res.statusCode >= 400) return 'info';
  const route = routePattern(req as Request);
  // No matched route and no error: a file of the web app (scripts, fonts, images), dozens per page load.
  if (route === null || PROBE_ROUTES.has(route)) return 'debug';
  return 'info';
}

export function requestLog(logger: Logger): RequestHandler {
  const logRequest = pinoHttp({
    logger,
    // The request's child logger carries only its id; the closing line is built from explicit fields below.
    quietReqLogger: true,
    quietResLogger: true,
    // Keep the logger's own serializers (log/logger.ts): pino-http's would write an error's every property.
    wrapSerializers: false,
    genReqId: (req, res) => {
      const id = requestIdOf(req);
      res.setHeader(REQUEST_ID_HEADER, id);
      return id;
    },
    customLogLevel: levelOf,
    customSuccessObject: (req, res, val: { responseTime?: unknown }) => lineOf(req, res, val.responseTime),
    // The error here is pino-http's own "failed with status code" or a socket error: safe fields only.
    customErrorObject: (req, res, err, val: { responseTime?: unknown }) => ({ ...lineOf(req, res, val.responseTime), err: errorFields(err) }),
    customSuccessMessage: (_req, res) => (res.writableEnded ? 'request completed' : 'request aborted'),
    customErrorMessage: () => 'request failed',
  });
  return (req, res, next) => {
    // The metrics middleware usually tracks the route already; tracking twice keeps the same pattern.
    if (!Object.getOwnPropertyDescriptor(req, 'route')?.get) trackRoutePattern(req);
    logRequest(req, res, next);
  };
}

/** A service's `log` port for this request: a warning on the request's logger with the error's safe fields. */
export function requestWarnLog(req: Request): (message: string, err: unknown) => void {
  return (message, err) => req.log.warn({ err: errorFields(err) }, message);
}
