// Rows of the `imports` table: stored previews and their apply state, read back as the API's summaries.
import { desc, eq } from 'drizzle-orm';
import type { Db } from '../../db/client';
import { imports } from '../../db/schema';
import type { ImportDetail, ImportPreview, ImportSummary } from '../../shared/imports';
import type { Queryable } from '../../db/client';

export type ImportRow = typeof imports.$inferSelect;

export function toSummary(row: ImportRow): ImportSummary {
  const preview = row.preview as ImportPreview;
  return {
    id: row.id, kind: row.kind, fileName: row.fileName, sizeBytes: row.sizeBytes, status: row.status,
    errorCount: row.errorCount, counts: preview.counts, failureReason: row.failureReason, createdBy: row.createdBy,
    createdAt: row.createdAt.toISOString(), appliedBy: row.appliedBy, appliedAt: row.appliedAt?.toISOString() ?? null,
  };
}

export function toDetail(row: ImportRow): ImportDetail {
  return { ...toSummary(row), preview: row.preview as ImportPreview };
}

export async function getImportRow(db: Queryable, id: string): Promise<ImportRow | null> {
  const [row] = await db.select().from(imports).where(eq(imports.id, id));
  return row ?? null;
}

export async function listImportRows(db: Db, page: { limit: number; offset: number }): Promise<ImportRow[]> {
  return db.select().from(imports).orderBy(desc(imports.createdAt), desc(imports.id)).limit(page.limit).offset(page.offset);
}
