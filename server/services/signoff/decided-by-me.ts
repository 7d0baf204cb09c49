// "Decided by me": one approver's decisions in API shape, newest first.
import type { Queryable } from '../../../db/client';
import type { DecidedByMe } from '../../../shared/signoff-mine';
import { selectDecisionsByApprover } from '../../queries/signoff/my-decisions';

export async function decidedByMe(db: Queryable, approverId: string, limit: number): Promise<DecidedByMe> {
  const rows = await selectDecisionsByApprover(db, approverId, limit);
  return {
    decisions: rows.map((r) => ({
      ...r, startsAt: r.startsAt.toISOString(), endsAt: r.endsAt.toISOString(), decidedAt: r.decidedAt.toISOString(),
    })),
  };
}
