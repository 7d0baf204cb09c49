// Telling "the database is unreachable just now" apart from every other failure, and waiting out such an outage.
// Connection-class failures are transient: the API answers them 503 DATABASE_UNAVAILABLE with Retry-After, and a
// job's final write is tried again until the database is back rather than losing a finished result.
import { setTimeout as delay } from 'node:timers/promises';

/** Socket-level codes Node gives a refused, reset, timed-out or unroutable connection. */
const SOCKET_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EPIPE', 'ENOTFOUND', 'EAI_AGAIN', 'EHOSTUNREACH', 'ENETUNREACH']);

/**
 * SQLSTATE 57P01 admin_shutdown (fast shutdown), 57P02 crash_shutdown, 57P03 cannot_connect_now (starting up or
 * shutting down), 53300 too_many_connections; and class 08, connection exceptions (PostgreSQL manual, Appendix A).
 */
const PG_CODES = new Set(['57P01', '57P02', '57P03', '53300']);

/** What node-postgres and pg-pool say (they set no code) when a connection dies or cannot be had in time. */
const MESSAGES = [
  /^Connection terminated/,
  /timeout exceeded when trying to connect/,
  /Client has encountered a connection error and is not queryable/,
  /Connection ended unexpectedly/,
];

type Carrier = { code?: unknown; message?: unknown; cause?: unknown; errors?: unknown };

function isConnectionClass(e: Carrier): boolean {
  if (typeof e.code === 'string' && (SOCKET_CODES.has(e.code) || PG_CODES.has(e.code) || /^08[0-9A-Z]{3}$/.test(e.code))) return true;
  return typeof e.message === 'string' && MESSAGES.some((m) => m.test(e.message as string));
}

/**
 * True when `err`, or an error it wraps (drizzle's `cause`, an AggregateError's `errors` from trying IPv6 and IPv4),
 * says the database could not be reached or dropped the connection.
 */
export function isDatabaseUnavailable(err: unknown, depth = 0): boolean {
  if (err === null || typeof err !== 'object' || depth > 4) return false;
  const e = err as Carrier;
  if (isConnectionClass(e)) return true;
  if (Array.isArray(e.errors) && e.errors.some((inner) => isDatabaseUnavailable(inner, depth + 1))) return true;
  return isDatabaseUnavailable(e.cause, depth + 1);
}

/** The code (socket or SQLSTATE) of the connection-class error inside `err`, for a log line or a probe; else null. */
export function unavailableCode(err: unknown, depth = 0): string | null {
  if (err === null || typeof err !== 'object' || depth > 4) return null;
  const e = err as Carrier;
  if (isConnectionClass(e) && typeof e.code === 'string') return e.code;
  const inner = Array.isArray(e.errors) ? e.errors.map((x) => unavailableCode(x, depth + 1)).find(Boolean) : null;
  return inner ?? unavailableCode(e.cause, depth + 1);
}

export type OutageRetryOptions = {
  /** give up (rethrow the last error) once this much time has passed; default 120 s */
  maxWaitMs?: number;
  /** first pause between tries; doubled each time up to `maxDelayMs` */
  firstDelayMs?: number;
  maxDelayMs?: number;
  /** told once per failed try */
  onWait?: (err: unknown, waitedMs: number) => void;
};

const RETRY_DEFAULTS = { maxWaitMs: 120_000, firstDelayMs: 250, maxDelayMs: 2_000 };

/**
 * Runs `fn`; while it fails because the database is unavailable, pauses and runs it again (bounded). Any other
 * error is thrown at once. For writes that must land once the database is back: a plan's result, "mail sent".
 */
export async function retryWhileDatabaseUnavailable<T>(fn: () => Promise<T>, options: OutageRetryOptions = {}): Promise<T> {
  const o = { ...RETRY_DEFAULTS, ...options };
  const startMs = Date.now();
  for (let pauseMs = o.firstDelayMs; ; pauseMs = Math.min(pauseMs * 2, o.maxDelayMs)) {
    try {
      return await fn();
    } catch (err) {
      const waitedMs = Date.now() - startMs;
      if (!isDatabaseUnavailable(err) || waitedMs + pauseMs > o.maxWaitMs) throw err;
      o.onWait?.(err, waitedMs);
      await delay(pauseMs);
    }
  }
}
