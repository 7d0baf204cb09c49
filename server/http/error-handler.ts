// The one error middleware: every failure leaves as { error: { code, message } } (+ details for validation).
import type { ErrorRequestHandler } from 'express';
import { ZodError } from 'zod';
import { AppError } from '../errors';

type ErrorBody = { error: { code: string; message: string; details?: { path: string; message: string }[] } };

function zodPath(path: PropertyKey[]): string {
  return path.reduce<string>((out, key) => (typeof key === 'number' ? `${out}[${key}]` : `${out}.${String(key)}`), '$');
}

/** Errors raised by express.json() carry a `type` and an HTTP status. */
function bodyParserError(err: unknown): { status: number; code: string; message: string } | null {
  const type = (err as { type?: unknown })?.type;
  if (type === 'entity.parse.failed') return { status: 400, code: 'BAD_JSON', message: 'The request body is not valid JSON.' };
  if (type === 'entity.too.large') return { status: 413, code: 'PAYLOAD_TOO_LARGE', message: 'The request body is too large.' };
  return null;
}

export function errorHandler({ log }: { log: (message: string, err: unknown) => void }): ErrorRequestHandler {
  return (err, _req, res, next) => {
    let status = 500;
    let body: ErrorBody = { error: { code: 'INTERNAL', message: 'Something went wrong on the server.' } };
    const parserError = bodyParserError(err);
    if (err instanceof AppError) {
      status = err.status;
      body = { error: { code: err.code, message: err.message } };
    } else if (err instanceof ZodError) {
      const details = err.issues.map((issue) => ({ path: zodPath(issue.path), message: issue.message }));
      status = 400;
      body = {
        error: { code: 'VALIDATION_FAILED', message: details.map((d) => `${d.path}: ${d.message}`).join('; '), details },
      };
    } else if (parserError) {
      status = parserError.status;
      body = { error: { code: parserError.code, message: parserError.message } };
    } else {
      log('unhandled error', err);
    }
    // Too late for our body: Express's default handler closes the connection.
    if (res.headersSent) return next(err);
    res.status(status).json(body);
  };
}
