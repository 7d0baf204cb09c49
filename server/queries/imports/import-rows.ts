// Rows of the `imports` table: stored previews, their apply state, and the page the import list shows.
import { desc, eq } from 'drizzle-orm';
import type { Db, Queryable, Tx } from '../../../db/client';
import { imports } from '../../../db/schema';

export type ImportRow = typeof imports.$inferSelect;
export type NewImportRow = typeof imports.$inferInsert;

/** The import; `forUpdate` holds the row until the transaction ends. */
export async function getImportRow(db: Queryable, id: string, opts: { forUpdate?: boolean } = {}): Promise<ImportRow | null> {
  const query = db.select().from(imports).where(eq(imports.id, id));
  const [row] = opts.forUpdate ? await query.for('update') : await query;
  return row ?? null;
}

export async function listImportRows(db: Db, page: { limit: number; offset: number }): Promise<ImportRow[]> {
  return db.select().from(imports).orderBy(desc(imports.createdAt), desc(imports.id)).limit(page.limit).offset(page.offset);
}

export async function insertImportRow(tx: Tx, row: NewImportRow): Promise<void> {
  await tx.insert(imports).values(row);
}

/** Moves an import to `superseded`, `applied` or `failed`, with the facts that state carries. */
export async function updateImportStatus(
  tx: Tx, id: string,
  change: { status: 'superseded' } | { status: 'applied'; appliedBy: string | null; appliedAt: Date } | { status: 'failed'; failureReason: string },
): Promise<void> {
  await tx.update(imports).set(change).where(eq(imports.id, id));
}
