// The refusal when a person already has as many unfinished jobs of a kind as they may: 429 TOO_MANY_WAITING.
import type { WaitingJobKind } from '../../../shared/job-limits';
import { AppError } from '../../errors';

/** What the jobs are called and what to do next, in the screens' own words. */
const WORDS: Record<WaitingJobKind, { one: string; many: string; next: string }> = {
  slotSearches: { one: 'slot search', many: 'slot searches', next: 'Wait for one to finish, then search again.' },
  campaignPlans: { one: 'campaign plan', many: 'campaign plans', next: 'Wait for one to finish, then plan this campaign again.' },
  planRuns: { one: 'move-plan run', many: 'move-plan runs', next: 'Wait for one to finish or cancel one, then run again.' },
};

export class TooManyWaitingError extends AppError {
  override readonly code = 'TOO_MANY_WAITING';
  override readonly status = 429;

  constructor(readonly kind: WaitingJobKind, readonly limit: number) {
    const words = WORDS[kind];
    super(`You already have ${limit} ${limit === 1 ? words.one : words.many} waiting or running. ${words.next}`);
  }
}
