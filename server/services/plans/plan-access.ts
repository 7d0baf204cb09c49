// Who may touch move plans: planners run, cancel and accept; approvers and admins read; tenants see nothing
// of plans (404, as if the route did not exist) and other staff get 403.
import type { RequestHandler } from 'express';
import type { RoleName } from '../../../shared/api';
import { ForbiddenError, RouteNotFoundError, UnauthenticatedError } from '../../errors';

export const PLAN_WRITERS: RoleName[] = ['planner'];
export const PLAN_READERS: RoleName[] = ['planner', 'approver', 'admin'];

export function planAccess(roles: RoleName[]): RequestHandler {
  return (req, _res, next) => {
    const user = req.user;
    if (!user) return next(new UnauthenticatedError());
    if (user.roles.some((r) => roles.includes(r))) return next();
    const tenantOnly = user.roles.length > 0 && user.roles.every((r) => r === 'tenant');
    next(tenantOnly ? new RouteNotFoundError(req.method, req.originalUrl.split('?')[0]) : new ForbiddenError());
  };
}
