// A window's stored impact as JSON text, kept per process for the windows read most. On a window touching 2,500
// slices the text is 1.5 MB and PostgreSQL spends ~45 ms turning the jsonb back into text on every read; a tiny
// query for the impact's stamp (version and time computed) says whether the kept text is still the stored one.
// Its compressed forms are kept beside it: compressing 1.5 MB on each read cost ~20 ms more of the event loop.
import { brotliCompressSync, constants, gzipSync } from 'node:zlib';
import type { Db, Queryable } from '../../../db/client';
import { getWindowImpactJson, getWindowImpactStamp } from '../../queries/windows/impacts';

/** Windows whose impact text one process keeps (least recently read goes first). */
const KEPT_WINDOWS = 16;

export type ImpactCoding = 'br' | 'gzip';

/** One stored impact: its JSON text, and that text compressed (made on first use, then kept with it). */
export class StoredImpact {
  private readonly coded = new Map<ImpactCoding, Buffer>();
  constructor(readonly json: string) {}

  encoded(coding: ImpactCoding): Buffer {
    let bytes = this.coded.get(coding);
    if (!bytes) {
      // Brotli quality 4, as the compression middleware uses for other answers: most of the gain at gzip's speed.
      bytes = coding === 'br'
        ? brotliCompressSync(this.json, { params: { [constants.BROTLI_PARAM_QUALITY]: 4 } })
        : gzipSync(this.json);
      this.coded.set(coding, bytes);
    }
    return bytes;
  }
}

type Kept = Map<string, { stamp: string; impact: StoredImpact }>;
const keptByDb = new WeakMap<Queryable, Kept>();

function keptFor(db: Queryable): Kept {
  let kept = keptByDb.get(db);
  if (!kept) keptByDb.set(db, (kept = new Map()));
  return kept;
}

/** The stored impact, or null when the window has none. */
export async function storedImpact(db: Db, windowId: string): Promise<StoredImpact | null> {
  const stamp = await getWindowImpactStamp(db, windowId);
  if (stamp === null) return null;
  const kept = keptFor(db);
  const hit = kept.get(windowId);
  kept.delete(windowId);
  if (hit?.stamp === stamp) {
    kept.set(windowId, hit);
    return hit.impact;
  }
  // Read after the stamp: if a new assessment lands in between, the text is newer than the stamp it is kept under,
  // so the next read misses and reads again; a kept text is never older than its stamp.
  const json = await getWindowImpactJson(db, windowId);
  if (json === null) return null;
  const impact = new StoredImpact(json);
  kept.set(windowId, { stamp, impact });
  for (const oldest of kept.keys()) {
    if (kept.size <= KEPT_WINDOWS) break;
    kept.delete(oldest);
  }
  return impact;
}
