// What an unexpected error may put in the log: its type, code, message and stack frames, and the same for its
// causes, but none of the request's values. A drizzle query error's message and fields carry the SQL and its
// parameters, and a pg error carries the statement position, detail (row values) and where; those are left out,
// as is the message of a pg data exception (SQLSTATE class 22), which quotes the value it refused.
const MAX_CAUSES = 3;

type ErrorLike = { name?: unknown; message?: unknown; stack?: unknown; code?: unknown; cause?: unknown; severity?: unknown };

/** Explicit, log-safe fields of an error (and of up to three causes under `cause`). */
export type SafeError = {
  type: string;
  message: string;
  /** an application code (WINDOW_NOT_FOUND) or a Node one (ECONNREFUSED) */
  errorCode?: string;
  /** a PostgreSQL SQLSTATE (23505, 57P01) */
  pgCode?: string;
  /** the stack's frames only */
  stack?: string;
  cause?: SafeError;
};

function isDrizzleQueryError(err: ErrorLike): boolean {
  return err.name === 'DrizzleQueryError' || (typeof err.message === 'string' && err.message.startsWith('Failed query: '));
}

/** pg's DatabaseError has a severity; a SQLSTATE is five digits or capitals. */
function isPgCode(err: ErrorLike): err is ErrorLike & { code: string } {
  return typeof err.code === 'string' && /^[0-9A-Z]{5}$/.test(err.code) && (typeof err.severity === 'string' || /\d/.test(err.code));
}

/** The stack's frames only: its first lines repeat the message, which for a query error holds the parameters. */
function framesOf(stack: unknown): string {
  if (typeof stack !== 'string') return '';
  return stack.split('\n').filter((line) => /^\s+at /.test(line)).join('\n');
}

function messageOf(err: ErrorLike): string {
  if (isDrizzleQueryError(err)) return 'database query failed (SQL and parameters not logged)';
  if (isPgCode(err) && err.code.startsWith('22')) return 'data exception (message not logged: it quotes the value)';
  return String(err.message ?? '');
}

function safeOne(err: ErrorLike): SafeError {
  const out: SafeError = { type: typeof err.name === 'string' ? err.name : 'Error', message: messageOf(err) };
  if (isPgCode(err)) out.pgCode = err.code;
  else if (typeof err.code === 'string') out.errorCode = err.code;
  const frames = framesOf(err.stack);
  if (frames) out.stack = frames;
  return out;
}

/** Log-safe fields for an unexpected error and up to three causes. */
export function errorFields(err: unknown, depth = 0): SafeError {
  if (err === null || typeof err !== 'object') return { type: `thrown ${err === null ? 'null' : typeof err}`, message: '' };
  const one = safeOne(err as ErrorLike);
  const cause = (err as ErrorLike).cause;
  if (depth < MAX_CAUSES && cause !== undefined && cause !== null) one.cause = errorFields(cause, depth + 1);
  return one;
}

/** The same fields as one text (type [code]: message, frames, "caused by" …), for plain-line ports. */
export function describeError(err: unknown): string {
  const parts: string[] = [];
  for (let f: SafeError | undefined = errorFields(err); f; f = f.cause) {
    const code = f.pgCode ?? f.errorCode;
    parts.push(`${f.type}${code ? ` [${code}]` : ''}${f.message ? `: ${f.message}` : ''}${f.stack ? `\n${f.stack}` : ''}`);
  }
  return parts.join('\ncaused by ');
}
