// Domain errors of tenant notices, each with a fixed code and HTTP status.
import { AppError } from '../../errors';

export class NoticeNotFoundError extends AppError {
  readonly code = 'NOTICE_NOT_FOUND';
  readonly status = 404;
  constructor(id: string) {
    super(`No notice ${id}.`);
  }
}

/** The notice or its window is not in a state that allows this (e.g. overriding a notice that is not blocked). */
export class NoticeStateError extends AppError {
  readonly code = 'NOTICE_STATE';
  readonly status = 409;
}
