// What an unexpected error may put in the log: its name, message and stack, and the same for its causes, but
// none of the request's values. A drizzle query error's message and fields carry the SQL and its parameters,
// and a pg error carries the statement position, detail (row values) and where; those are left out.
const MAX_CAUSES = 3;

type ErrorLike = { name?: unknown; message?: unknown; stack?: unknown; code?: unknown; cause?: unknown };

function isDrizzleQueryError(err: ErrorLike): boolean {
  return err.name === 'DrizzleQueryError' || (typeof err.message === 'string' && err.message.startsWith('Failed query: '));
}

/** The stack's frames only: its first lines repeat the message, which for a query error holds the parameters. */
function framesOf(stack: unknown): string {
  if (typeof stack !== 'string') return '';
  return stack.split('\n').filter((line) => /^\s+at /.test(line)).join('\n');
}

function describeOne(err: ErrorLike): string {
  const name = typeof err.name === 'string' ? err.name : 'Error';
  const message = isDrizzleQueryError(err) ? 'database query failed (SQL and parameters not logged)' : String(err.message ?? '');
  // A pg error's `code` is its SQLSTATE; Node's are like ECONNREFUSED. Neither carries request values.
  const code = typeof err.code === 'string' ? ` [${err.code}]` : '';
  const frames = framesOf(err.stack);
  return `${name}${code}: ${message}${frames ? `\n${frames}` : ''}`;
}

/** A log-safe text for an unexpected error and up to three causes. */
export function describeError(err: unknown): string {
  const parts: string[] = [];
  let current: unknown = err;
  for (let depth = 0; depth <= MAX_CAUSES && current !== undefined && current !== null; depth++) {
    if (typeof current !== 'object') {
      parts.push(`thrown ${typeof current}`);
      break;
    }
    parts.push(describeOne(current as ErrorLike));
    current = (current as ErrorLike).cause;
  }
  return parts.join('\ncaused by ');
}
