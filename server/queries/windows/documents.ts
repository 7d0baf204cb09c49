// A window's method-of-procedure document (bytes kept in PostgreSQL; one per window).
import { eq } from 'drizzle-orm';
import type { Tx } from '../../../db/client';
import { windowDocuments } from '../../../db/schema';
import type { Queryable } from '../../../db/client';

export type MopWrite = { windowId: string; fileName: string; mime: string; content: Buffer; uploadedBy: string; uploadedAt: Date };

export async function upsertWindowDocument(tx: Tx, doc: MopWrite): Promise<void> {
  const row = { ...doc, sizeBytes: doc.content.length };
  const { windowId: _id, ...set } = row;
  await tx.insert(windowDocuments).values(row).onConflictDoUpdate({ target: windowDocuments.windowId, set });
}

export async function getWindowDocument(db: Queryable, windowId: string) {
  const rows = await db.select().from(windowDocuments).where(eq(windowDocuments.windowId, windowId));
  return rows[0] ?? null;
}
