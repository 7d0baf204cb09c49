// Messages between the API process and a check thread (check-thread.ts ↔ check-thread-worker.ts).
import type { UploadRead, UploadReadInput } from './read-upload';

export type CheckRequest = { id: number; input: UploadReadInput };

/** Errors lose their class between threads; the code and status are enough to rebuild the domain error. */
/** A thread first says 'ready' once its code is loaded; then one reply per request. */
export type CheckReply =
  | { id: number; ok: true; value: UploadRead }
  | { id: number; ok: false; error: { code: string | null; status: number; message: string } };
