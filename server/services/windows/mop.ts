// The method-of-procedure document: type sniffing and storage with an audit row (parsing: server/http/mop-upload.ts).
import type { Db } from '../../../db/client';
import type { Me } from '../../../shared/api';
import { insertAuditEntry } from '../../queries/audit/audit-log';
import { getWindowDocument, upsertWindowDocument } from '../../queries/windows/documents';
import { MopFileNameError, MopMissingError, MopTypeError } from './errors';

export const MOP_MAX_BYTES = 10 * 1024 * 1024;
const PDF_MAGIC = Buffer.from('%PDF-');

/** An uploaded file as the HTTP layer hands it over (multer's in-memory file has this shape). */
export type UploadedFile = { buffer: Buffer; mimetype: string; originalname: string };

/** Trusts the bytes, not the browser's label: a PDF must start with %PDF-, text must be UTF-8 without NULs. */
export function sniffMopType(file: { buffer: Buffer; mimetype: string }): 'application/pdf' | 'text/plain' {
  if (file.buffer.subarray(0, PDF_MAGIC.length).equals(PDF_MAGIC)) return 'application/pdf';
  const declaredText = file.mimetype === 'text/plain' || file.mimetype.startsWith('text/plain;');
  if (declaredText && !file.buffer.includes(0)) {
    try {
      new TextDecoder('utf-8', { fatal: true }).decode(file.buffer);
      return 'text/plain';
    } catch {
      // falls through: not UTF-8
    }
  }
  throw new MopTypeError();
}

export async function storeMop(
  db: Db, windowId: string, file: UploadedFile | undefined, user: Me, now: Date,
): Promise<void> {
  if (!file) throw new MopMissingError();
  // PostgreSQL text cannot hold NUL, and no file system names a file with one: refused, not silently changed.
  if (file.originalname.includes('\0')) throw new MopFileNameError();
  const mime = sniffMopType(file);
  const fileName = file.originalname.replace(/[\\/\r\n]/g, '_').slice(0, 200) || 'mop';
  await db.transaction(async (tx) => {
    const previous = await getWindowDocument(tx, windowId);
    await upsertWindowDocument(tx, { windowId, fileName, mime, content: file.buffer, uploadedBy: user.id, uploadedAt: now });
    await insertAuditEntry(tx, {
      actorId: user.id, action: 'window.mop.upload', entity: 'window', entityId: windowId, at: now,
      before: previous && { fileName: previous.fileName, mime: previous.mime, sizeBytes: previous.sizeBytes },
      after: { fileName, mime, sizeBytes: file.buffer.length },
    });
  });
}
