// A window's lifecycle in plain words (DESIGN §3), and which actions a person may take on it now.
import type { RoleName } from '@/shared/api';
import { canBookWindows, windowIsAssessable, windowIsEditable } from '@/shared/permissions';
import type { WindowStatus } from '@/shared/windows';

export const STATUS_LABELS: Record<WindowStatus, string> = {
  draft: 'Draft',
  assessed: 'Assessed',
  planned: 'Planned',
  'in-review': 'In review',
  cleared: 'Cleared',
  returned: 'Returned',
  notified: 'Notified',
  underway: 'Underway',
  done: 'Done',
  'rolled-back': 'Rolled back',
  withdrawn: 'Withdrawn',
};

/** One sentence per state: where the window stands and what comes next. */
export const STATUS_SENTENCES: Record<WindowStatus, string> = {
  draft: 'Booked, but its impact on slices has not been worked out yet. Next: assess the impact.',
  assessed: 'The impact on slices is known. Next: a planner works out where the affected slices move.',
  planned: 'A move plan is accepted. Next: the change board signs it off.',
  'in-review': 'Waiting for the change board to sign off the plan.',
  cleared: 'Signed off. Next: the affected tenants are told.',
  returned: 'The change board sent the plan back. Next: the planner revises it.',
  notified: 'Tenants have been told. The work can start at the booked time.',
  underway: 'The work has started.',
  done: 'The work is finished.',
  'rolled-back': 'The work was undone and the network put back as it was.',
  withdrawn: 'Withdrawn: this work will not happen.',
};

/** The usual path through the lifecycle, for the step line on the detail screen. */
export const MAIN_PATH: readonly WindowStatus[] = ['draft', 'assessed', 'planned', 'in-review', 'cleared', 'notified', 'underway', 'done'];

export type WindowActions = { edit: boolean; assess: boolean; withdraw: boolean; rollBack: boolean; viewImpact: boolean };

export function windowActions(roles: readonly RoleName[], status: WindowStatus): WindowActions {
  const books = canBookWindows(roles);
  const beforeWork = windowIsEditable(status);
  return {
    edit: books && beforeWork,
    // The server lets anyone who books also assess (engineers check their own bookings).
    assess: books && windowIsAssessable(status),
    withdraw: books && beforeWork,
    // Only while the work is underway: the server puts every moved slice back and closes the window.
    rollBack: books && status === 'underway',
    // Tenants see their own slices in the impact too (the server trims it to them).
    viewImpact: status !== 'withdrawn',
  };
}
