// Domain errors of windows, freezes, MOP documents and policies; each with a fixed code and HTTP status.
import { AppError } from '../../errors';

export class WindowNotFoundError extends AppError {
  readonly code = 'WINDOW_NOT_FOUND';
  readonly status = 404;
  constructor(id: string) {
    super(`No window ${id}.`);
  }
}

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

export class FreezeConflictError extends AppError {
  readonly code = 'FREEZE_CONFLICT';
  readonly status = 409;
  constructor(freeze: { title: string; startsAt: Date; endsAt: Date }, hint: string) {
    super(`The window falls inside the freeze "${freeze.title}" (${freeze.startsAt.toISOString()} – ${freeze.endsAt.toISOString()}). ${hint}`);
  }
}

export class StaleVersionError extends AppError {
  readonly code = 'STALE_VERSION';
  readonly status = 409;
  constructor() {
    super('This window was changed by someone else; reload and try again.');
  }
}

export class WindowNotEditableError extends AppError {
  readonly code = 'WINDOW_NOT_EDITABLE';
  readonly status = 409;
  constructor(status: string) {
    super(`A window that is ${status} can no longer be edited.`);
  }
}

export class IllegalTransitionError extends AppError {
  readonly code = 'ILLEGAL_TRANSITION';
  readonly status = 409;
  constructor(from: string, to: string, why = '') {
    super(`A window cannot go from ${from} to ${to}.${why ? ` ${why}` : ''}`);
  }
}

export class ImpactNotFoundError extends AppError {
  readonly code = 'IMPACT_NOT_FOUND';
  readonly status = 404;
  constructor() {
    super('No impact is stored for this window yet; assess it first.');
  }
}

export class MopNotFoundError extends AppError {
  readonly code = 'MOP_NOT_FOUND';
  readonly status = 404;
  constructor() {
    super('No method-of-procedure document is attached to this window.');
  }
}

export class MopTooLargeError extends AppError {
  readonly code = 'MOP_TOO_LARGE';
  readonly status = 413;
  constructor(maxBytes: number) {
    super(`The document is larger than ${Math.round(maxBytes / 1_048_576)} MB.`);
  }
}

export class MopTypeError extends AppError {
  readonly code = 'MOP_UNSUPPORTED_TYPE';
  readonly status = 415;
  constructor() {
    super('Attach the method of procedure as a PDF or a plain-text file.');
  }
}

export class MopMissingError extends AppError {
  readonly code = 'MOP_MISSING';
  readonly status = 400;
  constructor() {
    super('Send the document as multipart form data in the field "file".');
  }
}

export class FreezeNotFoundError extends AppError {
  readonly code = 'FREEZE_NOT_FOUND';
  readonly status = 404;
  constructor(id: string) {
    super(`No freeze ${id}.`);
  }
}

/** A lifecycle step that exists but needs work from a later stage (a plan, a sign-off, notices). */
export class TransitionGuardedError extends AppError {
  readonly code = 'TRANSITION_GUARDED';
  readonly status = 409;
  constructor(to: string, needs: string) {
    super(`The window cannot move to ${to} yet: ${needs}`);
  }
}

export class FreezeOrderError extends AppError {
  readonly code = 'FREEZE_ENDS_BEFORE_START';
  readonly status = 400;
  constructor() {
    super('The freeze must end after it starts.');
  }
}
