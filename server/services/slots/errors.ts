// Errors of the slot finder: a request it cannot search (400, before any job is queued) and a search stopped
// between two candidates because its job was cancelled or is shutting down.
import { AppError } from '../../errors';

/** Unknown sites or spans, a timing with no usable list of starts, or work longer than policy allows. */
export class SlotRequestError extends AppError {
  override readonly code = 'SLOT_REQUEST_INVALID';
  override readonly status = 400;
  constructor(readonly problems: string[]) {
    super(problems.join(' '));
  }
}

/** The caller's signal was aborted; the search stopped before its next candidate. */
export class SlotSearchCancelledError extends AppError {
  override readonly code = 'SLOT_SEARCH_CANCELLED';
  override readonly status = 409;
  constructor(readonly done: number, readonly total: number) {
    super(`The slot search was stopped after ${done} of ${total} candidates.`);
  }
}
