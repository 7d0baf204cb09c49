// Route guards: requireAuth (401 without a session), requireRole (403 without one of the roles) and
// hideFromTenants (404 for tenant users, who must not learn that a staff-only resource exists).
import type { Request, RequestHandler } from 'express';
import type { RoleName } from '../../shared/api';
import { ForbiddenError, UnauthenticatedError } from '../errors';
import { tenantScopeOf } from '../services/windows/tenant-scope';

export const requireAuth: RequestHandler = (req, _res, next) => {
  next(req.user ? undefined : new UnauthenticatedError());
};

/** Passes when the user holds at least one of `roles`. */
export function requireRole(...roles: RoleName[]): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) return next(new UnauthenticatedError());
    const allowed = req.user.roles.some((role) => roles.includes(role));
    next(allowed ? undefined : new ForbiddenError());
  };
}

/** A tenant-scoped user gets `notFound(req)` (the same answer as a missing resource); others pass on. */
export function hideFromTenants(notFound: (req: Request) => Error): RequestHandler {
  return (req, _res, next) => {
    next(req.user && tenantScopeOf(req.user) !== null ? notFound(req) : undefined);
  };
}
