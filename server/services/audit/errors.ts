// Domain errors of the audit trail, each with a fixed code and HTTP status.
import { domainError } from '../../errors';

/** One CSV holds a bounded number of rows; a larger export is narrowed by its filters first. */
export class TooManyAuditRowsError extends domainError('TOO_MANY_ROWS', 422,
  (total: number, max: number) => `These filters match ${total} entries; one download holds at most ${max}. Narrow the date range or pick a window, person or action.`) {}
