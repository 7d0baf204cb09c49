// Domain errors: each class carries a fixed `code` and HTTP status; the error middleware maps them.
export class AppError extends Error {
  readonly code: string = 'INTERNAL';
  readonly status: number = 500;
}

export class BadCredentialsError extends AppError {
  readonly code = 'BAD_CREDENTIALS';
  readonly status = 401;
  constructor() {
    super('E-mail or password is not correct.');
  }
}

export class UnauthenticatedError extends AppError {
  readonly code = 'UNAUTHENTICATED';
  readonly status = 401;
  constructor() {
    super('Sign in to continue.');
  }
}

export class ForbiddenError extends AppError {
  readonly code = 'FORBIDDEN';
  readonly status = 403;
  constructor(message = 'Your roles do not allow this.') {
    super(message);
  }
}

export class BadOriginError extends AppError {
  readonly code = 'BAD_ORIGIN';
  readonly status = 403;
  constructor() {
    super('Cross-site request refused.');
  }
}

export class RouteNotFoundError extends AppError {
  readonly code = 'ROUTE_NOT_FOUND';
  readonly status = 404;
  constructor(method: string, path: string) {
    super(`No API route for ${method} ${path}.`);
  }
}

export class RateLimitedError extends AppError {
  readonly code = 'RATE_LIMITED';
  readonly status = 429;
  constructor() {
    super('Too many sign-in attempts. Wait a few minutes and try again.');
  }
}
