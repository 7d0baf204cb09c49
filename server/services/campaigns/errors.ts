// Domain errors of slot searches and campaigns; each with a fixed code and HTTP status.
import { AppError, domainError } from '../../errors';

export class SlotSearchNotFoundError extends domainError('SLOT_SEARCH_NOT_FOUND', 404, (id: string) => `No slot search ${id}.`) {}

export class CampaignNotFoundError extends domainError('CAMPAIGN_NOT_FOUND', 404, (id: string) => `No campaign ${id}.`) {}

export class SearchQueueUnavailableError extends domainError('QUEUE_UNAVAILABLE', 503,
  (what: string) => `The ${what} could not be queued; try again in a moment.`) {}

export class CampaignStaleError extends domainError('STALE_VERSION', 409,
  () => 'This campaign was changed by someone else; reload it and try again.') {}

export class CampaignNotDraftError extends domainError('CAMPAIGN_NOT_DRAFT', 409,
  (status: string) => `Only a draft campaign can be changed, booked or discarded; this one is ${status}.`) {}

export class CampaignEmptyError extends domainError('CAMPAIGN_EMPTY', 409,
  () => 'The campaign has no scheduled window to book.') {}

/** A change of a draft breaks the campaign's rules: every broken rule, in words. */
export class CampaignRulesError extends AppError {
  readonly code = 'CAMPAIGN_RULES';
  readonly status = 400;
  constructor(readonly issues: string[]) {
    super(issues.join(' '));
  }
}

/** One group's window broke a booking rule: nothing of the campaign was booked. Keeps the booking error's code. */
export class CampaignGroupBookingError extends AppError {
  override readonly code: string;
  override readonly status: number;
  constructor(label: string, cause: AppError) {
    super(`Nothing was booked: the window of group "${label}" cannot be booked. ${cause.message}`);
    this.code = cause.code;
    this.status = cause.status;
  }
}

/** A draft window now lies too near a window booked elsewhere that touches the same slices (the once-in-D-days rule). */
export class CampaignSpacingError extends domainError('CAMPAIGN_SPACING', 409, (reason: string) => reason) {}
