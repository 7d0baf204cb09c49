// A window's stored impact as JSON text, kept per process for the windows read most. On a window touching 2,500
// slices the text is 1.5 MB and PostgreSQL spends ~45 ms turning the jsonb back into text on every read; a tiny
// query for the impact's stamp (version and time computed) says whether the kept text is still the stored one.
import type { Db, Queryable } from '../../../db/client';
import { getWindowImpactJson, getWindowImpactStamp } from '../../queries/windows/impacts';

/** Windows whose impact text one process keeps (least recently read goes first). */
const KEPT_WINDOWS = 16;

type Kept = Map<string, { stamp: string; json: string }>;
const keptByDb = new WeakMap<Queryable, Kept>();

function keptFor(db: Queryable): Kept {
  let kept = keptByDb.get(db);
  if (!kept) keptByDb.set(db, (kept = new Map()));
  return kept;
}

/** The stored impact's JSON text, or null when the window has none. */
export async function storedImpactJson(db: Db, windowId: string): Promise<string | null> {
  const stamp = await getWindowImpactStamp(db, windowId);
  if (stamp === null) return null;
  const kept = keptFor(db);
  const hit = kept.get(windowId);
  kept.delete(windowId);
  if (hit?.stamp === stamp) {
    kept.set(windowId, hit);
    return hit.json;
  }
  // Read after the stamp: if a new assessment lands in between, the text is newer than the stamp it is kept under,
  // so the next read misses and reads again; a kept text is never older than its stamp.
  const json = await getWindowImpactJson(db, windowId);
  if (json === null) return null;
  kept.set(windowId, { stamp, json });
  for (const oldest of kept.keys()) {
    if (kept.size <= KEPT_WINDOWS) break;
    kept.delete(oldest);
  }
  return json;
}
