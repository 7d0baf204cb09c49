// Domain errors of windows, freezes, MOP documents and policies; each with a fixed code and HTTP status.
import { AppError, domainError } from '../../errors';
import { formatRangeIn, formatRangeUtc } from '../notices/notice-times';

export class WindowNotFoundError extends domainError('WINDOW_NOT_FOUND', 404, (id: string) => `No window ${id}.`) {}

/** A broken booking rule (codes from shared/window-checks.ts); the message lists every problem found. */
export class WindowInputError extends AppError {
  readonly status = 400;
  override readonly code: string;
  constructor(issues: { code: string; message: string }[]) {
    super(issues.map((i) => i.message).join(' '));
    this.code = issues[0].code;
  }
}

export class UnknownElementsError extends AppError {
  readonly code = 'UNKNOWN_ELEMENTS';
  readonly status = 400;
  constructor(readonly unknown: string[]) {
    super(`These sites or spans do not exist: ${unknown.join(', ')}.`);
  }
}

type Freeze = { title: string; startsAt: Date; endsAt: Date };

/** Names the freeze and its times in words, in the booker's zone with UTC beside them (never raw ISO). */
export class FreezeConflictError extends domainError('FREEZE_CONFLICT', 409, (freeze: Freeze, hint: string, timeZone: string) => {
  const local = formatRangeIn(freeze.startsAt, freeze.endsAt, timeZone);
  const utc = formatRangeUtc(freeze.startsAt, freeze.endsAt);
  const when = local === utc ? local : `${local}; ${utc}`;
  return `The window falls inside the freeze "${freeze.title}" (${when}). ${hint}`;
}) {}

export class StaleVersionError extends domainError('STALE_VERSION', 409,
  () => 'This window was changed by someone else; reload and try again.') {}

export class WindowNotEditableError extends domainError('WINDOW_NOT_EDITABLE', 409,
  (status: string) => `A window that is ${status} can no longer be edited.`) {}

export class IllegalTransitionError extends domainError('ILLEGAL_TRANSITION', 409,
  (from: string, to: string, why = '') => `A window cannot go from ${from} to ${to}.${why ? ` ${why}` : ''}`) {}

export class ImpactNotFoundError extends domainError('IMPACT_NOT_FOUND', 404,
  () => 'No impact is stored for this window yet; assess it first.') {}

export class MopNotFoundError extends domainError('MOP_NOT_FOUND', 404,
  () => 'No method-of-procedure document is attached to this window.') {}

export class MopTooLargeError extends domainError('MOP_TOO_LARGE', 413,
  (maxBytes: number) => `The document is larger than ${Math.round(maxBytes / 1_048_576)} MB.`) {}

export class MopTypeError extends domainError('MOP_UNSUPPORTED_TYPE', 415,
  () => 'Attach the method of procedure as a PDF or a plain-text file.') {}

export class MopMissingError extends domainError('MOP_MISSING', 400,
  () => 'Send the document as multipart form data in the field "file".') {}

export class MopFileNameError extends domainError('MOP_BAD_FILE_NAME', 400,
  () => 'The document\'s file name contains a NUL character; rename the file and upload it again.') {}

export class MopUploadUnreadableError extends domainError('MOP_BAD_UPLOAD', 400,
  (reason: string) => `The upload could not be read (${reason}); send the document as multipart form data in the field "file".`) {}

export class FreezeNotFoundError extends domainError('FREEZE_NOT_FOUND', 404, (id: string) => `No freeze ${id}.`) {}

/** A lifecycle step that exists but needs work from a later stage (a plan, a sign-off, notices). */
export class TransitionGuardedError extends domainError('TRANSITION_GUARDED', 409,
  (to: string, needs: string) => `The window cannot move to ${to} yet: ${needs}`) {}

export class FreezeOrderError extends domainError('FREEZE_ENDS_BEFORE_START', 400,
  () => 'The freeze must end after it starts.') {}
