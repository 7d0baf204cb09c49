// Booking rules that need the database: the shared checks, element ids that exist, and freezes.
import type { Me } from '../../../shared/api';
import { canBookInsideFreeze } from '../../../shared/permissions';
import { NETWORK_TIME_ZONE } from '../../../shared/time-zone';
import { elementIssues, timeIssues } from '../../../shared/window-checks';
import type { WindowElementInput } from '../../../shared/windows';
import { findUnknownElements } from '../../queries/windows/elements';
import { overlappingFreezes } from '../../queries/windows/freezes';
import { getPolicies } from '../../queries/windows/policies';
import type { ElementRow } from '../../queries/windows/window-rows';
import type { Queryable } from '../../../db/client';
import { FreezeConflictError, UnknownElementsError, WindowInputError } from './errors';

export type BookingCheck = {
  times?: { startsAt: string; endsAt: string };
  elements?: WindowElementInput[];
  freezeOverrideReason?: string | null;
};

/** Down elements carry no fraction; reduced ones keep theirs (already checked to lie in (0, 1)). */
export function toElementRows(elements: WindowElementInput[]): ElementRow[] {
  return elements.map((e) => ({ kind: e.kind, id: e.id, effect: e.effect, fraction: e.effect === 'reduced' ? e.fraction ?? null : null }));
}

/**
 * Throws the first broken rule (all issues of the input named in the message). Returns the freeze override
 * reason to store: the admin's reason when the times fall inside a freeze, otherwise null.
 */
export async function checkBooking(db: Queryable, check: BookingCheck, user: Me, now: Date): Promise<string | null> {
  const policy = await getPolicies(db);
  const issues = [
    ...(check.times ? timeIssues(check.times, policy, now) : []),
    ...(check.elements ? elementIssues(check.elements) : []),
  ];
  if (issues.length > 0) throw new WindowInputError(issues);
  if (check.elements) {
    const unknown = await findUnknownElements(db, check.elements);
    if (unknown.length > 0) throw new UnknownElementsError(unknown);
  }
  if (!check.times) return null;
  const [freeze] = await overlappingFreezes(db, new Date(check.times.startsAt), new Date(check.times.endsAt));
  if (!freeze) return null;
  const reason = check.freezeOverrideReason?.trim();
  const timeZone = user.timeZone ?? NETWORK_TIME_ZONE;
  if (!canBookInsideFreeze(user.roles)) throw new FreezeConflictError(freeze, 'Only an admin can book inside a freeze.', timeZone);
  if (!reason) throw new FreezeConflictError(freeze, 'An admin may override it by giving a written reason.', timeZone);
  return reason;
}
