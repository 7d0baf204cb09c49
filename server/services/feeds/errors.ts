// Domain errors of calendar feeds. The answer never repeats the address: it is a secret.
import { domainError } from '../../errors';

/** Unknown, replaced or malformed address, or an owner who may no longer read anything: all the same 404. */
export class FeedNotFoundError extends domainError('FEED_NOT_FOUND', 404, () => 'No calendar feed at this address.') {}
