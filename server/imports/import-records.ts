// Rows of the `imports` table read back as the API's summaries and details.
import type { ImportDetail, ImportPreview, ImportSummary } from '../../shared/imports';
import type { ImportRow } from '../queries/imports/import-rows';

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
