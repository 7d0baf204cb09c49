// Domain errors of tenant notices, each with a fixed code and HTTP status.
import { domainError } from '../../errors';

export class NoticeNotFoundError extends domainError('NOTICE_NOT_FOUND', 404, (id: string) => `No notice ${id}.`) {}

/** The notice or its window is not in a state that allows this (e.g. overriding a notice that is not blocked). */
export class NoticeStateError extends domainError('NOTICE_STATE', 409, (message: string) => message) {}
