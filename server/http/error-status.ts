// Errors raised by Express's own layers (body-parser, the router, multer, http-errors) carry an HTTP status
// and sometimes a `type`; these become our { code, message } with that status. Messages never quote the request.
// A database outage (connection refused, reset or ended by a restart) answers 503 with a Retry-After.
import { isDatabaseUnavailable } from '../db-unavailable';

export type KnownFailure = { status: number; code: string; message: string; retryAfterSeconds?: number };

/** Seconds a client is asked to wait after a 503 DATABASE_UNAVAILABLE: a restart usually takes a few. */
export const DATABASE_RETRY_AFTER_SECONDS = 5;

const DATABASE_UNAVAILABLE: KnownFailure = {
  status: 503, code: 'DATABASE_UNAVAILABLE', retryAfterSeconds: DATABASE_RETRY_AFTER_SECONDS,
  message: 'The database cannot be reached just now. Try again in a few seconds.',
};

const BY_TYPE: Record<string, KnownFailure> = {
  'entity.parse.failed': { status: 400, code: 'BAD_JSON', message: 'The request body is not valid JSON.' },
  'entity.too.large': { status: 413, code: 'PAYLOAD_TOO_LARGE', message: 'The request body is too large.' },
  // 415 is what RFC 9110 §15.5.16 names for a Content-Encoding the server does not accept.
  'encoding.unsupported': { status: 415, code: 'BAD_ENCODING', message: 'The request body\'s Content-Encoding is not supported; send identity, gzip, deflate or br.' },
  'charset.unsupported': { status: 415, code: 'BAD_CHARSET', message: 'The request body\'s charset is not supported; send UTF-8.' },
  'request.aborted': { status: 400, code: 'BAD_BODY', message: 'The request body ended early.' },
  'request.size.invalid': { status: 400, code: 'BAD_BODY', message: 'The request body\'s length does not match its Content-Length.' },
};

const BY_STATUS: Record<number, Pick<KnownFailure, 'code' | 'message'>> = {
  400: { code: 'BAD_REQUEST', message: 'The request is malformed.' },
  413: { code: 'PAYLOAD_TOO_LARGE', message: 'The request body is too large.' },
  415: { code: 'UNSUPPORTED_MEDIA_TYPE', message: 'The request body\'s type or encoding is not supported.' },
};

/** PostgreSQL's "invalid byte sequence" (NUL in text) and "unsupported Unicode escape" (\u0000 in jsonb). */
const PG_BAD_TEXT = new Set(['22021', '22P05']);

type Carrier = { status?: unknown; statusCode?: unknown; type?: unknown; code?: unknown; cause?: unknown };

function statusOf(err: Carrier): number | null {
  const status = typeof err.status === 'number' ? err.status : err.statusCode;
  return typeof status === 'number' && Number.isInteger(status) && status >= 400 && status < 500 ? status : null;
}

function isDecompressionError(err: Carrier): boolean {
  return typeof err.code === 'string' && (err.code.startsWith('Z_') || err.code.startsWith('ERR_BROTLI') || err.code.startsWith('ERR__'));
}

/** A second line of defence behind the input check: text PostgreSQL refused to store is the request's fault. */
function isPgBadText(err: Carrier): boolean {
  for (let e: Carrier | undefined = err, depth = 0; e && depth < 3; e = e.cause as Carrier | undefined, depth++) {
    if (typeof e.code === 'string' && PG_BAD_TEXT.has(e.code)) return true;
  }
  return false;
}

/** The answer for an error that carries a 4xx status, the database refusing the request's text, or a database
 * outage; else null. */
export function knownFailure(err: unknown): KnownFailure | null {
  if (err === null || typeof err !== 'object') return null;
  if (isDatabaseUnavailable(err)) return DATABASE_UNAVAILABLE;
  const carrier = err as Carrier;
  if (isPgBadText(carrier)) {
    return { status: 400, code: 'BAD_TEXT', message: 'A text value contains a character that cannot be stored (such as NUL, U+0000); remove it and try again.' };
  }
  const status = statusOf(carrier);
  if (status === null) return null;
  if (typeof carrier.type === 'string' && BY_TYPE[carrier.type]) return BY_TYPE[carrier.type];
  if (err instanceof URIError) return { status: 400, code: 'BAD_URL', message: 'The URL is not valid percent-encoding (RFC 3986, UTF-8).' };
  if (isDecompressionError(carrier)) {
    return { status: 400, code: 'BAD_ENCODING', message: 'The request body could not be decoded as its Content-Encoding says.' };
  }
  return { status, ...(BY_STATUS[status] ?? { code: `HTTP_${status}`, message: 'The request was refused.' }) };
}
