// Route guards: requireAuth (401 without a session), requireRole (403 without one of the roles),
// hideFromTenants (404 for tenant users, who must not learn that a staff-only resource exists), and
// currentUser, the signed-in user a handler behind these guards works for.
import type { Request, RequestHandler } from 'express';
import type { Me, RoleName } from '../../shared/api';
import { holdsAnyRole, tenantScopeOf } from '../../shared/permissions';
import { ForbiddenError, RouteNotFoundError, UnauthenticatedError } from '../errors';

export const requireAuth: RequestHandler = (req, _res, next) => {
  next(req.user ? undefined : new UnauthenticatedError());
};

/** Passes when the user holds at least one of `roles` (a set from shared/permissions.ts). */
export function requireRole(...roles: readonly RoleName[]): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) return next(new UnauthenticatedError());
    next(holdsAnyRole(req.user.roles, roles) ? undefined : new ForbiddenError());
  };
}

/** A tenant-scoped user gets `notFound(req)` (the same answer as a missing resource); others pass on. */
export function hideFromTenants(notFound: (req: Request) => Error): RequestHandler {
  return (req, _res, next) => {
    next(req.user && tenantScopeOf(req.user) !== null ? notFound(req) : undefined);
  };
}

/** For tenant users the route does not exist (404 ROUTE_NOT_FOUND); other users need one of `roles` (else 403). */
export function staffOnlyRoute(...roles: readonly RoleName[]): RequestHandler[] {
  return [hideFromTenants((req) => new RouteNotFoundError(req.method, req.originalUrl.split('?')[0])), requireRole(...roles)];
}

/** The signed-in user; 401 when there is none (a handler behind requireAuth or requireRole always has one). */
export function currentUser(req: Request): Me {
  if (!req.user) throw new UnauthenticatedError();
  return req.user;
}
