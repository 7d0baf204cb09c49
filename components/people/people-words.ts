// How roles and account states read on the People screen.
import type { RoleName } from '@/shared/api';
import type { PersonStatus } from '@/shared/people';
import { colors } from '@/constants/theme';

export const ROLE_LABELS: Record<RoleName, string> = {
  admin: 'Admin',
  engineer: 'Engineer',
  planner: 'Planner',
  approver: 'Approver',
  tenant: 'Tenant contact',
};

export const STATUS_LABELS: Record<PersonStatus, string> = { active: 'Active', invited: 'Invited', deactivated: 'Deactivated' };
export const STATUS_TONES: Record<PersonStatus, string> = { active: colors.primary, invited: colors.buoyDeep, deactivated: colors.inkFaint };

export const rolesText = (roles: readonly RoleName[]) => (roles.length === 0 ? 'No role' : roles.map((r) => ROLE_LABELS[r]).join(', '));

/** "5 Dec 2026, 14:30" in the viewer's zone. */
export function dayAndTime(iso: string, timeZone: string): string {
  return new Intl.DateTimeFormat('en-GB', {
    timeZone, day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit', hourCycle: 'h23',
  }).format(new Date(iso));
}
