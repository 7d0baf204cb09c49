// Who may do what with move plans (the API checks the same; this only hides buttons that would be refused).
import type { Me } from '@/shared/api';
import type { WindowStatus } from '@/shared/windows';

type Roles = readonly Me['roles'][number][];

/** Who may read runs (the API's plan readers); engineers and tenants are refused, so they see no entry. */
export function canReadPlans(roles: Roles): boolean {
  return roles.some((role) => role === 'planner' || role === 'approver' || role === 'admin');
}

/** Only planners run, cancel and accept plans. */
export function canPlan(roles: Roles): boolean {
  return roles.includes('planner');
}

/** A window can get new runs once its impact is known and until the work starts. */
const PLANNABLE: readonly WindowStatus[] = ['assessed', 'planned', 'returned'];

export function windowTakesRuns(status: WindowStatus): boolean {
  return PLANNABLE.includes(status);
}
