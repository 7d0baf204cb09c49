// The one error middleware: every failure leaves as { error: { code, message } } (+ details for validation).
// Errors carrying a 4xx status answer with it and a code, never 500. Only a real 500 is logged, and only as the
// route's pattern, a fixed message and the error's safe fields (errorFields): never request values.
import type { ErrorRequestHandler, Request } from 'express';
import { ZodError } from 'zod';
import { AppError } from '../errors';
import { routePattern } from '../metrics/route-pattern';
import { errorFields, type SafeError } from './error-log';
import { knownFailure } from './error-status';

type ErrorBody = { error: { code: string; message: string; details?: { path: string; message: string }[] } };

function zodPath(path: PropertyKey[]): string {
  return path.reduce<string>((out, key) => (typeof key === 'number' ? `${out}[${key}]` : `${out}.${String(key)}`), '$');
}

/** The matched route's pattern (`/api/windows/:id`), never the URL with its values; "(no route)" before matching. */
function routeOf(req: Request): string {
  const tracked = routePattern(req);
  if (tracked) return `${req.method} ${tracked}`;
  const pattern = (req.route as { path?: unknown } | undefined)?.path;
  return `${req.method} ${typeof pattern === 'string' ? `${req.baseUrl}${pattern}` : '(no route)'}`;
}

function answerFor(err: unknown): { status: number; body: ErrorBody; retryAfterSeconds?: number } | null {
  if (err instanceof AppError) return { status: err.status, body: { error: { code: err.code, message: err.message } } };
  if (err instanceof ZodError) {
    const details = err.issues.map((issue) => ({ path: zodPath(issue.path), message: issue.message }));
    const message = details.map((d) => `${d.path}: ${d.message}`).join('; ');
    return { status: 400, body: { error: { code: 'VALIDATION_FAILED', message, details } } };
  }
  const known = knownFailure(err);
  return known
    ? { status: known.status, body: { error: { code: known.code, message: known.message } }, retryAfterSeconds: known.retryAfterSeconds }
    : null;
}

/** Receives the error's safe fields only, never the error itself (its message may hold SQL parameters). */
export type ErrorLog = (message: string, err: SafeError, req: Request) => void;

export function errorHandler({ log }: { log: ErrorLog }): ErrorRequestHandler {
  return (err, req, res, next) => {
    const answer = answerFor(err);
    if (!answer) log(`INTERNAL on ${routeOf(req)}: unhandled error`, errorFields(err), req);
    // Too late for our body: Express's default handler closes the connection.
    if (res.headersSent) return next(err);
    const { status, body } = answer ?? { status: 500, body: { error: { code: 'INTERNAL', message: 'Something went wrong on the server.' } } };
    if (answer?.retryAfterSeconds) res.setHeader('Retry-After', String(answer.retryAfterSeconds));
    res.status(status).json(body);
  };
}
