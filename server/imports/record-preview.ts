// Stores a preview as an `imports` row (status previewed) with its audit entry, in one transaction.
import { randomUUID } from 'node:crypto';
import type { Db } from '../../db/client';
import { insertAuditEntry } from '../queries/audit/audit-log';
import { insertImportRow } from '../queries/imports/import-rows';
import type { PreviewResult } from './preview';

export async function recordPreview(
  db: Db, input: PreviewResult & { fileName: string; sizeBytes: number; userId: string | null; now: Date },
): Promise<string> {
  const id = `imp-${randomUUID()}`;
  const { kind, preview, payload, fileName, sizeBytes, userId, now } = input;
  await db.transaction(async (tx) => {
    await insertImportRow(tx, {
      id, kind, fileName, sizeBytes, status: 'previewed', preview, payload, errorCount: preview.errors.length,
      createdBy: userId, createdAt: now,
    });
    await insertAuditEntry(tx as unknown as Db, {
      actorId: userId, action: 'import.preview', entity: 'import', entityId: id, at: now,
      after: { kind, fileName, sizeBytes, counts: preview.counts },
    });
  });
  return id;
}
