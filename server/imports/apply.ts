// Applies a previewed import in one transaction, or refuses / fails leaving the inventory exactly as it was.
import type { Db, Tx } from '../../db/client';
import type { ImportApplied, ImportPreview } from '../../shared/imports';
import { AppError } from '../errors';
import { insertAuditEntry } from '../queries/audit/audit-log';
import { getImportRow, updateImportStatus, type ImportRow } from '../queries/imports/import-rows';
import { writeTarget } from '../queries/imports/write-target';
import { lockForTransaction } from '../queries/locks/advisory-locks';
import { loadNetworkScenario } from '../services/inventory/load-network-scenario';
import { scenarioChecksum } from './canonical';
import { diffScenarios } from './diff';
import { ImportApplyFailedError, ImportNotFoundError, ImportRefusedError } from './errors';
import type { ImportPayload } from './preview';

/** Serialises applies across server processes: two imports computed against the same state cannot both land. */
const APPLY_LOCK_KEY = 7_342_019;

function refuseUnlessPending(row: ImportRow): ImportPayload {
  if (row.status === 'applied') throw new ImportRefusedError('IMPORT_ALREADY_APPLIED', 409, 'This import has already been applied.');
  if (row.status === 'superseded') throw new ImportRefusedError('IMPORT_STALE', 409, 'The data changed since this preview; upload the file again.');
  if (row.status === 'failed') throw new ImportRefusedError('IMPORT_FAILED', 409, `This import failed earlier (${row.failureReason ?? 'no reason'}); upload the file again.`);
  if (row.errorCount > 0 || !row.payload) {
    throw new ImportRefusedError('IMPORT_HAS_ERRORS', 422, `The preview has ${row.errorCount} error(s); fix the file and upload it again.`);
  }
  return row.payload as ImportPayload;
}

type Outcome = { applied: ImportApplied } | { stale: true };

async function applyInTx(tx: Tx, id: string, userId: string | null, now: Date): Promise<Outcome> {
  await lockForTransaction(tx, APPLY_LOCK_KEY);
  const row = await getImportRow(tx, id, { forUpdate: true });
  if (!row) throw new ImportNotFoundError(id);
  const payload = refuseUnlessPending(row);
  const before = await loadNetworkScenario(tx);
  if (scenarioChecksum(before) !== payload.beforeChecksum) {
    await updateImportStatus(tx, id, { status: 'superseded' });
    return { stale: true };
  }
  await writeTarget(tx, payload.target, diffScenarios(before, payload.target), userId, now);
  await updateImportStatus(tx, id, { status: 'applied', appliedBy: userId, appliedAt: now });
  const counts = (row.preview as ImportPreview).counts;
  await insertAuditEntry(tx as unknown as Db, {
    actorId: userId, action: 'import.apply', entity: 'import', entityId: id, at: now,
    before: { checksum: payload.beforeChecksum },
    after: { kind: row.kind, fileName: row.fileName, counts, checksum: scenarioChecksum(payload.target) },
  });
  return { applied: { id, status: 'applied', counts, appliedAt: now.toISOString() } };
}

/** Marks the import failed (outside the rolled-back transaction) and records the failure in the audit log. */
async function markFailed(db: Db, id: string, reason: string, userId: string | null, now: Date): Promise<void> {
  await db.transaction(async (tx) => {
    await updateImportStatus(tx, id, { status: 'failed', failureReason: reason });
    await insertAuditEntry(tx as unknown as Db, { actorId: userId, action: 'import.apply-failed', entity: 'import', entityId: id, at: now, after: { reason } });
  });
}

export async function applyImport(db: Db, input: { id: string; userId: string | null; now: Date }): Promise<ImportApplied> {
  const { id, userId, now } = input;
  if (!(await getImportRow(db, id))) throw new ImportNotFoundError(id);
  let outcome: Outcome;
  try {
    outcome = await db.transaction((tx) => applyInTx(tx, id, userId, now));
  } catch (err) {
    if (err instanceof AppError) throw err;
    const reason = `the database refused the change: ${(err as Error).message}`;
    await markFailed(db, id, reason, userId, now);
    throw new ImportApplyFailedError(reason);
  }
  if ('stale' in outcome) throw new ImportRefusedError('IMPORT_STALE', 409, 'The data changed since this preview; nothing was applied. Upload the file again.');
  return outcome.applied;
}
