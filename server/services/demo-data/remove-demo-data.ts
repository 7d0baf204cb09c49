// Removing the demo from a running instance: a summary of what would go, and the removal in one transaction.
import type { Db } from '../../../db/client';
import type { DemoIdentity } from '../../../db/seed/demo-identity';
import type { DemoDataSummary, DemoRemovalResult } from '../../../shared/demo-data';
import { domainError } from '../../errors';
import { insertAuditEntry } from '../../queries/audit/audit-log';
import { deleteDemoRows } from '../../queries/demo-data/delete-demo-rows';
import { lockForTransaction } from '../../queries/locks/advisory-locks';
import { findDemoFootprint, isPresent } from './demo-footprint';

export class DemoDataAbsentError extends domainError('DEMO_DATA_ABSENT', 409,
  () => 'There is no demo data left to remove.') {}

/** Serialises removals across server processes: the second one finds nothing and answers 409. */
const DEMO_REMOVAL_LOCK_KEY = 7_530_811;

export async function summariseDemoData(db: Db, demo: DemoIdentity, callerId: string): Promise<DemoDataSummary> {
  const footprint = await findDemoFootprint(db, demo, callerId);
  return {
    present: isPresent(footprint.counts),
    counts: footprint.counts,
    accountNames: footprint.accounts.map((a) => a.name),
    keptAccount: footprint.keptAccount,
  };
}

/**
 * Finds and deletes the demo's rows inside one transaction, so what goes is exactly what was counted there; any
 * failure rolls everything back.
 */
export async function removeDemoData(db: Db, demo: DemoIdentity, { callerId, now }: { callerId: string; now: Date }): Promise<DemoRemovalResult> {
  return db.transaction(async (tx) => {
    await lockForTransaction(tx, DEMO_REMOVAL_LOCK_KEY);
    const footprint = await findDemoFootprint(tx, demo, callerId);
    if (!isPresent(footprint.counts)) throw new DemoDataAbsentError();
    await deleteDemoRows(tx, footprint.ids);
    await insertAuditEntry(tx, {
      actorId: callerId, action: 'demo-data.remove', entity: 'network', entityId: null, at: now,
      after: { counts: footprint.counts, accounts: footprint.accounts.map((a) => a.email) },
    });
    return { removed: footprint.counts, keptAccount: footprint.keptAccount };
  });
}
