// The process's logger (pino): one JSON object per line, or readable lines when standard output is a terminal.
// Callers log explicit fields only; the redaction list below is a backstop for a field added carelessly later.
import pino, { type DestinationStream, type Logger } from 'pino';
import pretty from 'pino-pretty';
import type { ServerConfig } from '../env';
import { errorFields } from '../http/error-log';

export type { Logger } from 'pino';

/**
 * WARNING: a backstop, not the rule. Secrets never belong in a log call in the first place; these paths replace
 * one should it appear (a body, a header set or a form passed whole by mistake).
 */
const REDACT_PATHS = [
  'password', '*.password', 'currentPassword', '*.currentPassword', 'newPassword', '*.newPassword',
  'token', '*.token', 'code', '*.code', 'cookie', '*.cookie', 'authorization', '*.authorization',
  'headers.cookie', 'headers.authorization', '*.headers.cookie', '*.headers.authorization', 'body', '*.body',
];

export type LoggerOptions = {
  level: ServerConfig['log']['level'];
  format: ServerConfig['log']['format'];
  /** where lines go (tests pass a stream they read); default standard output */
  destination?: DestinationStream;
  /** e.g. { service: 'worker' }; every line carries it */
  base?: Record<string, unknown>;
};

function usePretty(format: LoggerOptions['format']): boolean {
  return format === 'pretty' || (format === 'auto' && process.stdout.isTTY === true);
}

export function createLogger(options: LoggerOptions): Logger {
  const settings: pino.LoggerOptions = {
    level: options.level,
    base: { pid: process.pid, ...options.base },
    redact: { paths: REDACT_PATHS, censor: '[redacted]' },
    // `err` holds errorFields(...) already; an Error passed by mistake is reduced to the same safe fields
    // (pino's own serializer would write its message and every property, SQL parameters included).
    serializers: { err: (err: unknown) => (err instanceof Error ? errorFields(err) : err) },
    // ISO time: readable in a plain `grep`, and what log collectors parse without configuration.
    timestamp: pino.stdTimeFunctions.isoTime,
  };
  if (options.destination) return pino(settings, options.destination);
  // In-process pretty printing (no transport thread): simple, and a terminal is read by a person, not a collector.
  if (usePretty(options.format)) return pino(settings, pretty({ colorize: true, sync: true, ignore: 'pid,hostname' }));
  return pino(settings, pino.destination({ dest: 1, sync: true }));
}

/** A logger that writes nothing: createApp's default, so tests that build an app stay quiet. */
export function silentLogger(): Logger {
  return pino({ level: 'silent' });
}

/** For ports that take plain lines (the job workers, the mail sink): each line at `info`. */
export function lineLog(logger: Logger, level: 'info' | 'warn' | 'error' = 'info'): (line: string) => void {
  return (line) => logger[level](line);
}
