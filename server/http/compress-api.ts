// Compresses answers of about 1 KB and more (API JSON, calendar feeds, metrics) for clients that accept br or gzip.
import compression from 'compression';
import type { Request, RequestHandler, Response } from 'express';

/** Smaller answers fit in one packet either way; compressing them only costs CPU. */
export const COMPRESS_THRESHOLD_BYTES = 1024;

function shouldCompress(req: Request, res: Response): boolean {
  const type = String(res.getHeader('Content-Type') ?? '').toLowerCase();
  // A stream of events must reach the client as each is written, not when a compression block fills.
  if (type.startsWith('text/event-stream')) return false;
  // A byte range of a file names bytes of the file itself; compressing it would break the range.
  if (req.headers.range || res.statusCode === 206) return false;
  // The default filter skips types that are compressed already (images, archives, woff2) and non-compressible ones.
  return compression.filter(req, res);
}

export function compressAnswers(): RequestHandler {
  return compression({ threshold: COMPRESS_THRESHOLD_BYTES, filter: shouldCompress }) as RequestHandler;
}
