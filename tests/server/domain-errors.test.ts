// domainError(): the classes declared with it keep what the error middleware and the tests rely on.
import { AppError, BadCredentialsError, domainError, ForbiddenError, RouteNotFoundError } from '../../server/errors';

class SampleError extends domainError('SAMPLE', 409, (id: string, why = '') => `Sample ${id}.${why ? ` ${why}` : ''}`) {}

test('an instance carries the fixed code and status and the message built from its arguments', () => {
  const err = new SampleError('s-1', 'Busy.');
  expect([err.code, err.status, err.message]).toEqual(['SAMPLE', 409, 'Sample s-1. Busy.']);
  expect(new SampleError('s-2').message).toBe('Sample s-2.');
});

test('instanceof holds for the class, AppError and Error, and not across classes made by domainError', () => {
  const err = new RouteNotFoundError('GET', '/api/nowhere');
  expect(err).toBeInstanceOf(RouteNotFoundError);
  expect(err).toBeInstanceOf(AppError);
  expect(err).toBeInstanceOf(Error);
  expect(err).not.toBeInstanceOf(SampleError);
  expect(new BadCredentialsError()).not.toBeInstanceOf(ForbiddenError);
  expect(err.constructor.name).toBe('RouteNotFoundError');
  expect([err.code, err.status, err.message]).toEqual(['ROUTE_NOT_FOUND', 404, 'No API route for GET /api/nowhere.']);
});

test('an optional argument falls back to the default message', () => {
  expect(new ForbiddenError().message).toBe('Your roles do not allow this.');
  expect(new ForbiddenError('Only the owner may do this.').message).toBe('Only the owner may do this.');
  expect(new ForbiddenError().status).toBe(403);
});
