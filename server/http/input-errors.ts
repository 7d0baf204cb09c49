// The input-hygiene refusals: each names the field or part of the request, never quotes the value.
import { domainError } from '../errors';

export class BadTextError extends domainError('BAD_TEXT', 400,
  (field: string, reason: string) => `${field} contains ${reason}; remove it and try again.`) {}

export class BadUrlError extends domainError('BAD_URL', 400,
  (where: string) => `The URL's ${where} is not valid percent-encoding (RFC 3986, UTF-8).`) {}
