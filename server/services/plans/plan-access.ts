// Who may touch move plans: planners run, cancel and accept; approvers and admins read; tenants see nothing
// of plans (404, as if the route did not exist) and other staff get 403.
import type { RequestHandler } from 'express';
import type { RoleName } from '../../../shared/api';
import { hideFromTenants, requireRole } from '../../auth/guards';
import { RouteNotFoundError } from '../../errors';

export const PLAN_WRITERS: RoleName[] = ['planner'];
export const PLAN_READERS: RoleName[] = ['planner', 'approver', 'admin'];

const plansHidden = hideFromTenants((req) => new RouteNotFoundError(req.method, req.originalUrl.split('?')[0]));

export function planAccess(roles: RoleName[]): RequestHandler[] {
  return [plansHidden, requireRole(...roles)];
}
