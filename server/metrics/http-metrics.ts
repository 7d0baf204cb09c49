// Counts and times every HTTP request into slackwater_http_request_duration_seconds, labelled by the route
// pattern (bounded: never the URL's values), the method and the status.
import type { Request, RequestHandler } from 'express';
import { httpRequestDuration } from './registry';
import { routePattern, trackRoutePattern } from './route-pattern';

const METHODS = new Set(['GET', 'HEAD', 'POST', 'PUT', 'PATCH', 'DELETE', 'OPTIONS']);

/** The route label: the matched pattern, or one of two fixed names so unmatched URLs never become labels. */
export function routeLabel(req: Request): string {
  const pattern = routePattern(req);
  if (pattern) return pattern;
  // API requests refused before a route matched (no such route, bad input) vs. the web app's files and pages.
  return req.originalUrl.startsWith('/api/') || req.originalUrl === '/api' ? '(no route)' : '(web app)';
}

export function httpMetrics(): RequestHandler {
  return (req, res, next) => {
    const started = process.hrtime.bigint();
    trackRoutePattern(req);
    res.on('finish', () => {
      const seconds = Number(process.hrtime.bigint() - started) / 1e9;
      const method = METHODS.has(req.method) ? req.method : 'other';
      httpRequestDuration.observe({ method, route: routeLabel(req), status: String(res.statusCode) }, seconds);
    });
    next();
  };
}
