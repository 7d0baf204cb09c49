// Route guards: requireAuth (401 without a session) and requireRole (403 without one of the roles).
import type { RequestHandler } from 'express';
import type { RoleName } from '../../shared/api';
import { ForbiddenError, UnauthenticatedError } from '../errors';

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
