// Domain errors: each class carries a fixed `code` and HTTP status; the error middleware maps them.
export class AppError extends Error {
  readonly code: string = 'INTERNAL';
  readonly status: number = 500;
}

/**
 * The base for a domain error that is only a code, a status and a message (built from the constructor's
 * arguments): `export class XError extends domainError('X', 409, (id: string) => `…${id}`) {}`. Declaring a
 * named class on top keeps `instanceof`, the class name and the type.
 */
export function domainError<C extends string, A extends unknown[] = []>(code: C, status: number, message: (...args: A) => string) {
  return class extends AppError {
    override readonly code: C = code;
    override readonly status: number = status;
    constructor(...args: A) {
      super(message(...args));
    }
  };
}

export class BadCredentialsError extends domainError('BAD_CREDENTIALS', 401, () => 'E-mail or password is not correct.') {}

export class UnauthenticatedError extends domainError('UNAUTHENTICATED', 401, () => 'Sign in to continue.') {}

export class ForbiddenError extends domainError('FORBIDDEN', 403, (message?: string) => message ?? 'Your roles do not allow this.') {}

export class BadOriginError extends domainError('BAD_ORIGIN', 403, () => 'Cross-site request refused.') {}

export class RouteNotFoundError extends domainError('ROUTE_NOT_FOUND', 404,
  (method: string, path: string) => `No API route for ${method} ${path}.`) {}
