// Database reachability for the health route.
import { sql } from 'drizzle-orm';
import type { Db } from '../../../db/client';

/** True when `select 1` answers within `timeoutMs`; never throws. */
export async function pingDatabase(db: Db, { timeoutMs }: { timeoutMs: number }): Promise<boolean> {
  let timer: NodeJS.Timeout | undefined;
  const timeout = new Promise<false>((resolve) => {
    timer = setTimeout(() => resolve(false), timeoutMs);
  });
  const ping = db.execute(sql`select 1`).then(() => true, () => false);
  try {
    return await Promise.race([ping, timeout]);
  } finally {
    clearTimeout(timer);
  }
}
