// Issues tenant notices for a window that has just been cleared (first version: contract only; filled in next).
import type { ServerConfig } from '../../env';
import type { JobQueue } from '../../jobs/queue';
import type { Queryable } from '../../queries/windows/window-rows';

export type NoticeDeps = { jobs: JobQueue; config: ServerConfig; now: Date };

/**
 * Composes one notice per affected tenant of a `cleared` window, queues the mails of those within lead time,
 * leaves late ones `blocked`, and moves the window to `notified` when none is blocked.
 * Runs inside the caller's transaction.
 */
export async function issueNotices(
  tx: Queryable, deps: NoticeDeps, windowId: string, actorId: string,
): Promise<{ queued: number; blocked: number }> {
  void tx; void deps; void windowId; void actorId;
  return { queued: 0, blocked: 0 };
}
