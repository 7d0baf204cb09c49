// Domain errors of the change-board pack, each with a fixed code and HTTP status.
import { domainError } from '../../errors';

/** The moves CSV lists an accepted plan's steps; a window without one has nothing to list yet. */
export class NoPlanToListError extends domainError('NO_PLAN_YET', 409,
  (title: string) => `“${title}” has no accepted move plan yet, so there are no moves to list; accept a plan first.`) {}
